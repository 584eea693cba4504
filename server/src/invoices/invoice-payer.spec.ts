import { addressLines, payerKey, payerOf } from './invoice-payer';

describe('payerOf', () => {
  const ticket = { customerId: 'customer-1', stopId: 'stop-1' };

  it('bills the stop when the stop pays for its people', () => {
    const sut = payerOf(ticket, 'stop');
    expect(sut).toEqual({ billTo: 'stop', customerId: null, stopId: 'stop-1' });
    expect(payerKey(sut)).toBe('stop:stop-1');
  });

  it('bills the customer otherwise, and always for a ticket with no stop (a mailed-in drop-off)', () => {
    expect(payerOf(ticket, 'customer')).toEqual({ billTo: 'customer', customerId: 'customer-1', stopId: null });
    expect(payerOf({ customerId: 'customer-1', stopId: null }, 'stop').billTo).toBe('customer');
    expect(payerKey(payerOf(ticket, null))).toBe('customer:customer-1');
  });
});

describe('addressLines', () => {
  it('prints street, "city, region postcode" and country, leaving out what is empty', () => {
    const place = { street: '12 Invoice Row', city: 'Larkhaven', region: 'MN', postalCode: '55901', country: 'US' };
    expect(addressLines(place)).toEqual(['12 Invoice Row', 'Larkhaven, MN 55901', 'US']);
    expect(addressLines({ ...place, region: '', postalCode: '' })).toEqual(['12 Invoice Row', 'Larkhaven', 'US']);
  });
});

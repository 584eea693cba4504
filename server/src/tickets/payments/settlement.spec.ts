import { DomainError } from '../../common/errors/domain-error';
import { checkPayment, checkToInvoice, paidCents, type PayableTicket } from './settlement';

const finished: PayableTicket = { status: 'finished', settlement: 'unpaid', totalCents: 5000, currency: 'USD' };
const cash = (amountCents: number) => ({ method: 'cash' as const, amountCents, reference: '' });

function refusal(call: () => unknown): { code: string; message: string; fields?: Record<string, string[]> } {
  try {
    call();
  } catch (error) {
    if (error instanceof DomainError) return { code: error.code, message: error.message, fields: error.fields };
    throw error;
  }
  throw new Error('expected a refusal');
}

describe('checkPayment', () => {
  it('is paid on site once the payments reach the total; a part payment leaves it unpaid', () => {
    expect(checkPayment(finished, 0, cash(2000))).toBe('unpaid');
    expect(checkPayment(finished, 2000, cash(3000))).toBe('paid-on-site');
    expect(paidCents([{ amountCents: 2000 }, { amountCents: 3000 }])).toBe(5000);
  });

  it('asks for the cheque number or the terminal reference', () => {
    expect(
      refusal(() => checkPayment(finished, 0, { method: 'cheque', amountCents: 100, reference: '' })).fields,
    ).toEqual({ reference: ['Enter the cheque number.'] });
    expect(checkPayment(finished, 0, { method: 'card-terminal', amountCents: 5000, reference: 'T-77' })).toBe(
      'paid-on-site',
    );
  });

  it('refuses more than the balance, an open ticket, a paid one, and one left for an invoice', () => {
    expect(refusal(() => checkPayment(finished, 1000, cash(4001))).message).toContain('$40.00');
    expect(refusal(() => checkPayment({ ...finished, status: 'open' }, 0, cash(1))).code).toBe('conflict');
    expect(refusal(() => checkPayment(finished, 5000, cash(1))).message).toMatch(/already paid/);
    expect(refusal(() => checkPayment({ ...finished, settlement: 'to-invoice' }, 0, cash(1))).message).toMatch(
      /invoice/,
    );
  });
});

describe('checkToInvoice', () => {
  it('leaves an unpaid finished ticket for an invoice, never an open or paid one', () => {
    expect(() => checkToInvoice(finished)).not.toThrow();
    expect(refusal(() => checkToInvoice({ ...finished, status: 'open' })).code).toBe('conflict');
    expect(refusal(() => checkToInvoice({ ...finished, settlement: 'paid-on-site' })).code).toBe('conflict');
  });
});

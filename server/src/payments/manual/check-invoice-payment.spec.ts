import { DomainError } from '../../common/errors/domain-error';
import { checkInvoicePayment, type ManualPayment } from './check-invoice-payment';

const invoice = (over: Partial<Parameters<typeof checkInvoicePayment>[0]> = {}) => ({
  status: 'sent' as const,
  number: 'KR-2026-0001',
  currency: 'USD',
  totalCents: 10_000,
  paidCents: 0,
  creditedCents: 0,
  ...over,
});
const cash = (amountCents: number): ManualPayment => ({ method: 'cash', amountCents, reference: '' });

function refusal(run: () => void): DomainError {
  try {
    run();
  } catch (error) {
    if (error instanceof DomainError) return error;
    throw error;
  }
  throw new Error('expected a refusal');
}

describe('checkInvoicePayment', () => {
  it('takes a part payment and exactly the balance', () => {
    expect(() => checkInvoicePayment(invoice(), cash(4_000))).not.toThrow();
    expect(() => checkInvoicePayment(invoice({ paidCents: 4_000, creditedCents: 1_000 }), cash(5_000))).not.toThrow();
  });

  it('refuses one cent more than the balance left after payments and credit notes', () => {
    const error = refusal(() => checkInvoicePayment(invoice({ paidCents: 4_000, creditedCents: 1_000 }), cash(5_001)));
    expect(error.code).toBe('invalid_input');
    expect(error.message).toContain('$50.00');
    expect(error.fields).toHaveProperty('amountCents');
  });

  it('wants a cheque number and a terminal reference, not a reference for cash', () => {
    expect(refusal(() => checkInvoicePayment(invoice(), { ...cash(100), method: 'cheque' })).fields).toHaveProperty(
      'reference',
    );
    expect(refusal(() => checkInvoicePayment(invoice(), { ...cash(100), method: 'card-terminal' })).message).toMatch(
      /terminal/,
    );
    expect(() =>
      checkInvoicePayment(invoice(), { method: 'cheque', amountCents: 100, reference: '1042' }),
    ).not.toThrow();
  });

  it('refuses drafts, void invoices and settled ones as conflicts', () => {
    expect(refusal(() => checkInvoicePayment(invoice({ status: 'draft', number: null }), cash(1))).code).toBe(
      'conflict',
    );
    expect(refusal(() => checkInvoicePayment(invoice({ status: 'void' }), cash(1))).code).toBe('conflict');
    expect(refusal(() => checkInvoicePayment(invoice({ status: 'paid', paidCents: 10_000 }), cash(1))).code).toBe(
      'conflict',
    );
  });
});

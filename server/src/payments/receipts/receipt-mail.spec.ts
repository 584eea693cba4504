import { receiptMail, type ReceiptContent } from './receipt-mail';

const content = (over: Partial<ReceiptContent> = {}): ReceiptContent => ({
  businessName: 'Bright Edge Sharpening (demo)',
  billToName: 'Tamsin <Reed>',
  invoiceNumber: 'KR-2026-0007',
  currency: 'USD',
  amountCents: 2_000,
  method: 'card-terminal',
  reference: 'T-88',
  // 03:30 UTC on 2 Dec is still 1 Dec in Chicago: the receipt dates the payment in the business's own zone.
  receivedAt: new Date('2026-12-02T03:30:00Z'),
  timeZone: 'America/Chicago',
  totalCents: 4_830,
  paidCents: 2_000,
  balanceCents: 2_830,
  payUrl: 'http://127.0.0.1:3000/pay/abc.def',
  ...over,
});

describe('receiptMail', () => {
  it('says what came in, how, when, and what is still owed, with the pay link', () => {
    const sut = receiptMail(content());
    expect(sut.subject).toBe('Receipt for $20.00: invoice KR-2026-0007');
    expect(sut.text).toContain(
      'We received $20.00 (card (terminal), reference T-88) on December 1, 2026 for invoice KR-2026-0007.',
    );
    expect(sut.text).toContain('Invoice total $48.30, paid so far $20.00, balance due $28.30.');
    expect(sut.text).toContain('http://127.0.0.1:3000/pay/abc.def');
  });

  it('says paid in full without a pay link, and escapes names in the HTML part', () => {
    const sut = receiptMail(
      content({ method: 'cash', reference: '', balanceCents: 0, paidCents: 4_830, payUrl: null }),
    );
    expect(sut.text).toContain('We received $20.00 (cash) on');
    expect(sut.text).toContain('Invoice KR-2026-0007 is paid in full.');
    expect(sut.text).not.toContain('/pay/');
    expect(sut.html).toContain('Hello Tamsin &lt;Reed&gt;,');
    expect(sut.html).not.toContain('<Reed>');
  });
});

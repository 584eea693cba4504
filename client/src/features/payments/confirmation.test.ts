import { describe, expect, it } from 'vitest';
import { confirmationFrom } from './confirmation';
import { discountFrom } from './format';
import { publicInvoice, statusPoll } from './testing/fixtures';

describe('confirmationFrom', () => {
  it('waits until the server answers, and while the invoice is still only sent', () => {
    expect(confirmationFrom(undefined, 0)).toBe('waiting');
    expect(confirmationFrom(statusPoll(), 0)).toBe('waiting');
  });

  it('takes "paid" and "void" from the server as they are', () => {
    expect(confirmationFrom(statusPoll({ status: 'paid', paidCents: 4676, balanceCents: 0 }), null)).toBe('paid');
    expect(confirmationFrom(statusPoll({ status: 'void' }), 0)).toBe('void');
  });

  it('counts "part-paid" only when more is paid than before the checkout', () => {
    const partPaid = statusPoll({ status: 'part-paid', paidCents: 1000, balanceCents: 3676 });
    expect(confirmationFrom(partPaid, 0)).toBe('part-paid');
    expect(confirmationFrom(partPaid, 1000)).toBe('waiting');
    expect(confirmationFrom(partPaid, null)).toBe('waiting');
  });
});

describe('discountFrom', () => {
  it('is what the lines and tax leave over the total', () => {
    // 3000 + 1800 of lines, 356 of tax, 4676 total: 480 of discount (10% of 4800).
    expect(discountFrom(publicInvoice())).toBe(480);
    expect(discountFrom(publicInvoice({ taxCents: 0, totalCents: 4800 }))).toBe(0);
  });
});

import { describe, expect, it } from 'vitest';
import { describeEntry } from './labels';
import { auditEntry } from './testing/fixtures';

describe('an audit entry in words', () => {
  it('says a price set by hand from → to with the reason', () => {
    expect(describeEntry(auditEntry())).toBe('$42.00 → $27.50 · Loyal shop');
  });

  it('says how much was paid, how, on what and with which reference', () => {
    const cheque = auditEntry({
      action: 'payment-recorded',
      subjectType: 'invoice',
      detail: {
        paymentId: 'p-1',
        invoiceNumber: 'KR-2026-0007',
        method: 'cheque',
        amountCents: 1500,
        reference: '2207',
      },
    });
    expect(describeEntry(cheque)).toBe('$15.00 by cheque · on KR-2026-0007 · ref. 2207');
    const cash = auditEntry({
      action: 'payment-recorded',
      detail: { paymentId: 'p-2', method: 'cash', amountCents: 1000, reference: '' },
    });
    expect(describeEntry(cash)).toBe('$10.00 in cash · on site');
  });

  it('names roles and refusals in the app’s words', () => {
    const changed = auditEntry({
      action: 'role-changed',
      subjectType: 'user',
      detail: { email: 'sam@demo.keenroute.test', from: 'client', to: 'sharpener' },
    });
    expect(describeEntry(changed)).toBe('sam@demo.keenroute.test: Client → Sharpener');
    const refused = auditEntry({ action: 'sign-in-failed', actorId: null, detail: { reason: 'unknown-email' } });
    expect(describeEntry(refused)).toBe('No account has this e-mail');
  });

  it('leaves out a separator where a voided invoice has no reason', () => {
    const voided = auditEntry({
      action: 'invoice-voided',
      subjectType: 'invoice',
      detail: { number: 'KR-2026-0003', from: 'sent', totalCents: 9742, reason: null },
    });
    expect(describeEntry(voided)).toBe('KR-2026-0003, $97.42');
  });
});

import type { BusinessProfile } from '../entities/business-profile.entity';
import type { Invoice } from '../entities/invoice.entity';
import type { InvoiceDocument } from '../documents/invoice-document';
import { reminderMail } from './reminder-mail';

const PAY_URL = 'http://127.0.0.1:3000/pay/0b7e6f1c-3f55-4c1e-9a51-7d2a9e0c1b2d.c2lnbmF0dXJl';

function document(invoice: Partial<Invoice> = {}, extra: Partial<InvoiceDocument> = {}): InvoiceDocument {
  return {
    invoice: {
      number: 'KR-2026-0011',
      status: 'sent',
      billToName: 'Juniper Vale (demo)',
      currency: 'USD',
      issueDate: '2026-11-03',
      dueDate: '2026-11-17',
      totalCents: 4830,
      paidCents: 0,
      creditedCents: 0,
      ...invoice,
    } as Invoice,
    lines: [],
    payments: [],
    creditNotes: [],
    profile: { name: 'Larkhaven Edge Works (demo)', phone: '555-0142', email: '' } as BusinessProfile,
    logo: null,
    balanceCents: 4830,
    payUrl: PAY_URL,
    ...extra,
  };
}

describe('reminderMail', () => {
  it('says how overdue the invoice is in the subject', () => {
    expect(reminderMail(document(), { daysOverdue: 8, final: false }).subject).toBe(
      'Reminder: invoice KR-2026-0011 is 8 days overdue',
    );
    expect(reminderMail(document(), { daysOverdue: 1, final: true }).subject).toBe(
      'Final reminder: invoice KR-2026-0011 is 1 day overdue',
    );
  });

  it('gives the due date, the balance and the pay link in text and HTML', () => {
    const mail = reminderMail(document(), { daysOverdue: 8, final: false });
    expect(mail.text).toContain('Invoice KR-2026-0011 for $48.30 was due on 2026-11-17, 8 days ago.');
    expect(mail.text).toContain('$48.30 is still owed on it.');
    expect(mail.text).toContain(PAY_URL);
    expect(mail.html).toContain(`<a href="${PAY_URL}">`);
    expect(mail.text).not.toContain('Thank you for the');
    expect(mail.text).not.toContain('last reminder');
  });

  it('thanks for a part already paid and asks for the rest', () => {
    const mail = reminderMail(document({ status: 'part-paid', paidCents: 2000, creditedCents: 330 }), {
      daysOverdue: 22,
      final: true,
    });
    expect(mail.text).toContain('Thank you for the $23.30 already received or credited.');
    expect(mail.text).toContain('This is our last reminder for this invoice');
  });

  it('escapes names in the HTML part', () => {
    const mail = reminderMail(document({ billToName: 'Cut <b>&</b> Co' }), { daysOverdue: 8, final: false });
    expect(mail.html).toContain('Hello Cut &lt;b&gt;&amp;&lt;/b&gt; Co,');
  });
});

import type { BusinessProfile } from '../entities/business-profile.entity';
import type { Invoice } from '../entities/invoice.entity';
import type { InvoiceDocument } from './invoice-document';
import { invoiceMail } from './invoice-mail';

const PAY_URL = 'http://127.0.0.1:3000/pay/0b7e6f1c-3f55-4c1e-9a51-7d2a9e0c1b2d.c2lnbmF0dXJl';

function document(invoice: Partial<Invoice>, extra: Partial<InvoiceDocument> = {}): InvoiceDocument {
  return {
    invoice: {
      number: 'KR-2026-0007',
      status: 'sent',
      billToName: 'Wren Talbot (demo)',
      currency: 'USD',
      issueDate: '2026-12-03',
      dueDate: '2026-12-17',
      totalCents: 9255,
      ...invoice,
    } as Invoice,
    lines: [],
    payments: [],
    creditNotes: [],
    profile: { name: 'Larkhaven Edge Works (demo)', phone: '555-0142', email: '' } as BusinessProfile,
    logo: null,
    balanceCents: 7255,
    payUrl: PAY_URL,
    ...extra,
  };
}

describe('invoiceMail', () => {
  it('names the invoice and the business in the subject', () => {
    expect(invoiceMail(document({})).subject).toBe('Invoice KR-2026-0007 from Larkhaven Edge Works (demo)');
  });

  it('gives the total, due date, balance and the pay link in text and HTML', () => {
    const mail = invoiceMail(document({}));
    expect(mail.text).toContain('Attached is invoice KR-2026-0007 for $92.55, issued 2026-12-03 and due 2026-12-17.');
    expect(mail.text).toContain('Balance due: $72.55.');
    expect(mail.text).toContain(PAY_URL);
    expect(mail.html).toContain(`<a href="${PAY_URL}">`);
    expect(mail.text).toContain('555-0142');
  });

  it('says a paid invoice is paid and leaves the pay link out', () => {
    const mail = invoiceMail(document({ status: 'paid' }, { balanceCents: 0, payUrl: null }));
    expect(mail.text).toContain('It is paid in full');
    expect(mail.text).not.toContain('/pay/');
    expect(mail.html).not.toContain('/pay/');
  });

  it('escapes names in the HTML part', () => {
    const mail = invoiceMail(document({ billToName: 'Cut <b>&</b> Co' }));
    expect(mail.html).toContain('Hello Cut &lt;b&gt;&amp;&lt;/b&gt; Co,');
    expect(mail.text).toContain('Hello Cut <b>&</b> Co,');
  });
});

import sharp from 'sharp';
import type { BusinessProfile } from '../entities/business-profile.entity';
import type { Invoice } from '../entities/invoice.entity';
import type { InvoiceLine } from '../entities/invoice-line.entity';
import type { InvoiceDocument } from './invoice-document';
import { rateLabel, renderInvoicePdf, taxNote } from './invoice-pdf';

const PAY_URL =
  'http://127.0.0.1:3000/pay/0b7e6f1c-3f55-4c1e-9a51-7d2a9e0c1b2d.Qm9ndXNfc2lnbmF0dXJlX2Zvcl9hX3Rlc3RfX19fX19fX18';

/** An invented demo invoice: two shears at 8.25 %, a 10 % discount, part-paid. Amounts follow from the lines. */
function demoDocument(overrides: Partial<Invoice> = {}, logo: Buffer | null = null): InvoiceDocument {
  const lines = [
    { description: 'Convex 6.5 in straight shear, Wren Talbot (demo)', amountCents: 4500 },
    { description: 'Bevel 7 in thinning shear, Wren Talbot (demo)', amountCents: 3800 },
    { description: 'Trip charge, Pine Street Salon (demo)', amountCents: 1200 },
  ].map(
    (line, position) =>
      ({ ...line, id: `line-${position}`, position, kind: 'shear', taxable: true, taxRateBp: 825 }) as InvoiceLine,
  );
  const linesCents = 9500;
  const discount = 950; // 10 % of 95.00
  const subtotal = linesCents - discount;
  const tax = Math.round((subtotal * 825) / 10_000); // 8550 × 8.25 % = 705.375 → 705
  const invoice = {
    id: '0b7e6f1c-3f55-4c1e-9a51-7d2a9e0c1b2d',
    number: 'KR-2026-0007',
    status: 'part-paid',
    billTo: 'customer',
    billToName: 'Wren Talbot (demo)',
    billToEmail: 'wren@demo.keenroute.test',
    billToAddress: 'c/o Pine Street Salon (demo)\n12 Invoice Row\nLarkhaven',
    currency: 'USD',
    issueDate: '2026-12-03',
    dueDate: '2026-12-17',
    termsDays: 14,
    discountBp: 1000,
    discountCents: 0,
    linesCents,
    discountTotalCents: discount,
    subtotalCents: subtotal,
    taxCents: tax,
    totalCents: subtotal + tax,
    taxGroups: [{ taxRateBp: 825, taxableCents: subtotal, taxCents: tax }],
    paidCents: 2000,
    creditedCents: 0,
    notes: 'Left at the front desk.',
    voidReason: null,
    ...overrides,
  } as Invoice;
  const profile = {
    name: 'Larkhaven Edge Works (demo)',
    street: '8 Whetstone Lane',
    city: 'Larkhaven',
    region: 'LS',
    postalCode: '55901',
    phone: '555-0142',
    email: 'office@edgeworks.demo.test',
    website: '',
    taxId: '41-7788123',
    invoiceFooter: 'Thank you for keeping your shears sharp.',
  } as BusinessProfile;
  const balance = invoice.status === 'void' ? 0 : invoice.totalCents - invoice.paidCents - invoice.creditedCents;
  return {
    invoice,
    lines,
    payments: [],
    creditNotes: [],
    profile,
    logo,
    balanceCents: Math.max(0, balance),
    payUrl: balance > 0 && invoice.status !== 'void' ? PAY_URL : null,
  };
}

// Test pictures are made without transparency, so each is one image object (no separate mask).
const imageCount = (pdf: Buffer) => pdf.toString('latin1').match(/\/Subtype \/Image/g)?.length ?? 0;
const pageCount = (pdf: Buffer) => pdf.toString('latin1').match(/\/Type \/Page\b/g)?.length ?? 0;

// What the PDF says is read back with pdf-parse in test/invoice-documents.e2e-spec.ts (pdf.js needs the e2e's
// --experimental-vm-modules); here: the structure pdfkit writes.
describe('renderInvoicePdf', () => {
  it('writes a one-page PDF for an issued, a draft, a paid and a void invoice', async () => {
    const documents = [
      demoDocument(),
      demoDocument({ number: null, status: 'draft', issueDate: null, dueDate: null }),
      demoDocument({ status: 'paid', paidCents: 9255 }),
      demoDocument({ status: 'void', voidReason: 'Billed to the wrong salon' }),
    ];
    for (const document of documents) {
      const pdf = await renderInvoicePdf(document, null);
      expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
      expect(pageCount(pdf)).toBe(1);
    }
  });

  it('embeds the logo and the QR code as images', async () => {
    const logo = await sharp({ create: { width: 300, height: 80, channels: 3, background: '#1d5c63' } })
      .png()
      .toBuffer();
    const qr = await sharp({ create: { width: 64, height: 64, channels: 3, background: '#000000' } })
      .png()
      .toBuffer();
    expect(imageCount(await renderInvoicePdf(demoDocument(), null))).toBe(0);
    expect(imageCount(await renderInvoicePdf(demoDocument({}, logo), null))).toBe(1);
    expect(imageCount(await renderInvoicePdf(demoDocument({}, logo), qr))).toBe(2);
  });

  it('prints without the logo when the stored file is not an image pdfkit can read', async () => {
    const pdf = await renderInvoicePdf(demoDocument({}, Buffer.from('not a picture')), null);
    expect(imageCount(pdf)).toBe(0);
  });

  it('moves to further pages when the lines do not fit on one', async () => {
    const document = demoDocument();
    document.lines = Array.from({ length: 60 }, (_, i) => ({ ...document.lines[0]!, id: `l${i}`, position: i }));
    expect(pageCount(await renderInvoicePdf(document, null))).toBeGreaterThan(1);
  });
});

describe('rateLabel and taxNote', () => {
  it('writes basis points as a per cent without trailing zeros', () => {
    expect(rateLabel(825)).toBe('8.25 %');
    expect(rateLabel(600)).toBe('6 %');
    expect(rateLabel(1050)).toBe('10.5 %');
  });

  it('names the rates charged, or says none was', () => {
    expect(taxNote(demoDocument())).toContain('Sales tax at 8.25 %');
    expect(taxNote(demoDocument({ taxGroups: [], taxCents: 0 }))).toBe('No sales tax is charged on this invoice.');
  });
});

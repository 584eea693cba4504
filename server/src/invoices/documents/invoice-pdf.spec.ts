import sharp from 'sharp';
import { demoDocument } from '../../../test/utils/invoice-document-fixture';
import { rateLabel, renderInvoicePdf, taxNote } from './invoice-pdf';

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

import { INTER, INTER_BOLD } from './fonts';

/** US Letter in points, and the house colours (PRODUCT.md: deep teal), shared by every business document. */
export const PAGE = { margin: 48, width: 612 } as const;
export const CONTENT_WIDTH = PAGE.width - 2 * PAGE.margin;
export const COLOURS = { teal: '#1d5c63', grey: '#555555', ink: '#000000' } as const;

export interface Letterhead {
  name: string;
  street: string;
  city: string;
  region: string;
  postalCode: string;
  phone: string;
  email: string;
  website: string;
  taxId: string;
}

/** The business at the top: its logo on the left when there is one, its name and contact lines on the right. */
export function drawLetterhead(doc: PDFKit.PDFDocument, profile: Letterhead, logo: Buffer | null): void {
  const top = PAGE.margin;
  let logoBottom = top;
  if (logo) {
    try {
      doc.image(logo, PAGE.margin, top, { fit: [160, 64] });
      logoBottom = top + 64;
    } catch {
      // A logo file that pdfkit cannot read leaves the header text-only rather than failing the document.
    }
  }
  const x = PAGE.margin + CONTENT_WIDTH / 2;
  const width = CONTENT_WIDTH / 2;
  doc.font(INTER_BOLD).fontSize(12).fillColor(COLOURS.ink);
  doc.text(profile.name || 'Business name not set', x, top, { width, align: 'right' });
  doc.font(INTER).fontSize(9).fillColor(COLOURS.grey);
  const cityLine = [profile.city, [profile.region, profile.postalCode].filter(Boolean).join(' ')]
    .filter(Boolean)
    .join(', ');
  const lines = [
    profile.street,
    cityLine,
    [profile.phone, profile.email].filter(Boolean).join(' · '),
    profile.website,
    profile.taxId ? `Tax ID ${profile.taxId}` : '',
  ].filter(Boolean);
  for (const line of lines) doc.text(line, { width, align: 'right' });
  doc.y = Math.max(doc.y, logoBottom) + 24;
  doc.x = PAGE.margin;
}

export interface Addressee {
  /** "Invoice KR-2026-0001", "Statement of account". */
  title: string;
  /** "Bill to", "Account". */
  label: string;
  name: string;
  lines: readonly string[];
  email: string | null;
  /** Label and value pairs on the right: dates, terms, period. */
  facts: readonly (readonly [string, string])[];
  factLabelWidth?: number;
}

/** The title, then who the document is to on the left and its facts on the right. */
export function drawAddressee(doc: PDFKit.PDFDocument, addressee: Addressee): void {
  const labelWidth = addressee.factLabelWidth ?? 80;
  doc.font(INTER_BOLD).fontSize(20).fillColor(COLOURS.teal).text(addressee.title, PAGE.margin, doc.y);
  doc.moveDown(0.5);
  const top = doc.y;
  const half = CONTENT_WIDTH / 2;
  doc
    .font(INTER_BOLD)
    .fontSize(9)
    .fillColor(COLOURS.grey)
    .text(addressee.label, PAGE.margin, top, { width: half - 12 });
  doc
    .font(INTER_BOLD)
    .fontSize(11)
    .fillColor(COLOURS.ink)
    .text(addressee.name, { width: half - 12 });
  doc.font(INTER).fontSize(9);
  for (const line of addressee.lines) doc.text(line, { width: half - 12 });
  if (addressee.email) doc.text(addressee.email, { width: half - 12 });
  const leftBottom = doc.y;
  doc.y = top;
  for (const [label, value] of addressee.facts) {
    const y = doc.y;
    doc
      .font(INTER)
      .fontSize(9)
      .fillColor(COLOURS.grey)
      .text(label, PAGE.margin + half, y, { width: labelWidth });
    doc
      .font(INTER_BOLD)
      .fillColor(COLOURS.ink)
      .text(value, PAGE.margin + half + labelWidth, y, { width: half - labelWidth, align: 'right' });
  }
  doc.y = Math.max(leftBottom, doc.y) + 20;
  doc.x = PAGE.margin;
}

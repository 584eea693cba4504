import { formatMoney } from '@keenroute/shared';
import { INTER, INTER_BOLD } from '../../common/pdf/fonts';
import { COLOURS, CONTENT_WIDTH, PAGE, drawAddressee, drawLetterhead } from '../../common/pdf/letterhead';
import { renderToBuffer } from '../../common/pdf/render-to-buffer';
import type { PaymentMethod } from '../../payments/entities/payment.entity';
import type { InvoiceDocument } from './invoice-document';

const MARGIN = PAGE.margin;
const AMOUNT_WIDTH = 90;
const TAX_WIDTH = 70;
const { teal: TEAL, grey: GREY, ink: INK } = COLOURS;
const QR_SIZE = 96;

const METHOD_LABELS: Readonly<Record<PaymentMethod, string>> = {
  cash: 'Cash',
  cheque: 'Cheque',
  'card-terminal': 'Card on the terminal',
  online: 'Paid online',
};

/** 825 bp → "8.25 %", 600 → "6 %". */
export function rateLabel(bp: number): string {
  return `${(bp / 100).toFixed(2).replace(/\.?0+$/, '')} %`;
}

/** The document's title line: the number once issued. */
export function invoiceTitle(invoice: InvoiceDocument['invoice']): string {
  return invoice.number ? `Invoice ${invoice.number}` : 'Draft invoice';
}

/** What the tax lines mean, in a sentence under them: which rates were charged, or that none was. */
export function taxNote(document: InvoiceDocument): string {
  const charged = document.invoice.taxGroups.filter((group) => group.taxRateBp > 0);
  if (charged.length === 0) return 'No sales tax is charged on this invoice.';
  const rates = charged.map((group) => rateLabel(group.taxRateBp)).join(', ');
  return (
    `Sales tax at ${rates} on the lines marked with a rate, after any discount; lines marked "no tax" carry none. ` +
    'Tax is worked out per invoice and rounded to the cent.'
  );
}

/**
 * The printed invoice: the business (and logo) at the top, the title and dates, who it is to, the lines, discount,
 * tax per rate, total, what was paid or credited and the balance due, then how to pay (link and QR code), the tax note
 * and the business's footer. A paid or void invoice carries a stamp.
 */
export function renderInvoicePdf(document: InvoiceDocument, payQr: Buffer | null): Promise<Buffer> {
  const { invoice, profile } = document;
  const options: PDFKit.PDFDocumentOptions = {
    size: 'LETTER',
    margin: MARGIN,
    // Kept in memory so the stamp can go back onto the first page at the end.
    bufferPages: true,
    info: { Title: `${invoiceTitle(invoice)} – ${profile.name || 'Keenroute'}`, Creator: 'Keenroute' },
  };
  return renderToBuffer(options, (doc) => {
    drawLetterhead(doc, profile, document.logo);
    drawParties(doc, document);
    drawLines(doc, document);
    drawTotals(doc, document);
    drawLedger(doc, document);
    drawPayment(doc, document, payQr);
    drawNotes(doc, document);
    drawStamp(doc, document);
  });
}

const money = (document: InvoiceDocument, cents: number) => formatMoney(cents, document.invoice.currency);

/** Starts a new page when fewer than `height` points are left. */
function room(doc: PDFKit.PDFDocument, height: number): void {
  if (doc.y + height > doc.page.height - MARGIN) doc.addPage();
}

function drawParties(doc: PDFKit.PDFDocument, { invoice }: InvoiceDocument): void {
  drawAddressee(doc, {
    title: invoiceTitle(invoice),
    label: 'Bill to',
    name: invoice.billToName,
    lines: invoice.billToAddress.split('\n').filter(Boolean),
    email: invoice.billToEmail,
    facts: invoice.issueDate
      ? [
          ['Issue date', invoice.issueDate],
          ['Due date', invoice.dueDate ?? '–'],
          ['Terms', invoice.termsDays === 0 ? 'Due on receipt' : `${invoice.termsDays} days`],
        ]
      : [['Status', 'Draft: the number and dates are given when it is issued']],
  });
}

function drawLines(doc: PDFKit.PDFDocument, document: InvoiceDocument): void {
  const descriptionWidth = CONTENT_WIDTH - TAX_WIDTH - AMOUNT_WIDTH;
  const taxX = MARGIN + descriptionWidth;
  const amountX = taxX + TAX_WIDTH;
  const header = () => {
    const y = doc.y;
    doc.font(INTER_BOLD).fontSize(9).fillColor(GREY);
    doc.text('Description', MARGIN, y, { width: descriptionWidth });
    doc.text('Tax', taxX, y, { width: TAX_WIDTH, align: 'right' });
    doc.text('Amount', amountX, y, { width: AMOUNT_WIDTH, align: 'right' });
    doc
      .moveTo(MARGIN, doc.y + 2)
      .lineTo(MARGIN + CONTENT_WIDTH, doc.y + 2)
      .strokeColor(GREY)
      .lineWidth(0.5)
      .stroke();
    doc.y += 6;
  };
  header();
  doc.font(INTER).fontSize(10).fillColor(INK);
  for (const line of document.lines) {
    const height = doc.heightOfString(line.description, { width: descriptionWidth - 8 });
    if (doc.y + height > doc.page.height - MARGIN) {
      doc.addPage();
      header();
      doc.font(INTER).fontSize(10).fillColor(INK);
    }
    const y = doc.y;
    doc.text(line.description, MARGIN, y, { width: descriptionWidth - 8 });
    const bottom = doc.y;
    doc.fillColor(GREY).text(line.taxable && line.taxRateBp > 0 ? rateLabel(line.taxRateBp) : 'no tax', taxX, y, {
      width: TAX_WIDTH,
      align: 'right',
    });
    doc.fillColor(INK).text(money(document, line.amountCents), amountX, y, { width: AMOUNT_WIDTH, align: 'right' });
    doc.y = bottom + 4;
  }
  doc.x = MARGIN;
}

function drawTotals(doc: PDFKit.PDFDocument, document: InvoiceDocument): void {
  const { invoice } = document;
  const rows: { label: string; cents: number; strong?: boolean }[] = [];
  if (invoice.discountTotalCents > 0) {
    rows.push({ label: 'Lines', cents: invoice.linesCents });
    const share = invoice.discountBp > 0 ? ` (${rateLabel(invoice.discountBp)})` : '';
    rows.push({ label: `Discount${share}`, cents: -invoice.discountTotalCents });
  }
  rows.push({ label: 'Subtotal', cents: invoice.subtotalCents });
  const charged = invoice.taxGroups.filter((group) => group.taxRateBp > 0);
  if (charged.length === 0) rows.push({ label: 'Tax', cents: 0 });
  for (const group of charged) {
    rows.push({
      label: `Tax ${rateLabel(group.taxRateBp)} on ${money(document, group.taxableCents)}`,
      cents: group.taxCents,
    });
  }
  rows.push({ label: 'Total', cents: invoice.totalCents, strong: true });
  if (invoice.paidCents > 0) rows.push({ label: 'Paid', cents: -invoice.paidCents });
  if (invoice.creditedCents > 0) rows.push({ label: 'Credited', cents: -invoice.creditedCents });
  rows.push({ label: 'Balance due', cents: document.balanceCents, strong: true });

  room(doc, rows.length * 16 + 12);
  doc.y += 6;
  const labelX = MARGIN + CONTENT_WIDTH - AMOUNT_WIDTH - 240;
  for (const row of rows) {
    const y = doc.y;
    doc
      .font(row.strong ? INTER_BOLD : INTER)
      .fontSize(row.strong ? 11 : 10)
      .fillColor(INK);
    doc.text(row.label, labelX, y, { width: 232, align: 'right' });
    doc.text(money(document, row.cents), MARGIN + CONTENT_WIDTH - AMOUNT_WIDTH, y, {
      width: AMOUNT_WIDTH,
      align: 'right',
    });
    doc.y += 2;
  }
  doc.x = MARGIN;
  doc.moveDown();
}

function drawLedger(doc: PDFKit.PDFDocument, document: InvoiceDocument): void {
  const entries = [
    ...document.payments.map((payment) => ({
      when: payment.recordedAt,
      text:
        `${payment.recordedAt.toISOString().slice(0, 10)}  ${METHOD_LABELS[payment.method]}` +
        (payment.ticketId ? ' (on site)' : '') +
        (payment.reference ? `, ref. ${payment.reference}` : '') +
        `  ${money(document, payment.amountCents)}`,
    })),
    ...document.creditNotes.map((note) => ({
      when: note.createdAt,
      text:
        `${note.createdAt.toISOString().slice(0, 10)}  Credit note ${note.number}: ${note.reason}` +
        `  ${money(document, note.amountCents)}`,
    })),
  ].sort((a, b) => a.when.getTime() - b.when.getTime());
  if (entries.length === 0) return;
  room(doc, 30 + entries.length * 12);
  doc.font(INTER_BOLD).fontSize(10).fillColor(TEAL).text('Payments and credits', MARGIN, doc.y);
  doc.font(INTER).fontSize(9).fillColor(INK);
  for (const entry of entries) doc.text(entry.text, { width: CONTENT_WIDTH });
  doc.moveDown();
}

function drawPayment(doc: PDFKit.PDFDocument, document: InvoiceDocument, payQr: Buffer | null): void {
  if (!document.payUrl) return;
  room(doc, QR_SIZE + 60);
  doc.font(INTER_BOLD).fontSize(10).fillColor(TEAL).text('Pay online', MARGIN, doc.y);
  doc.font(INTER).fontSize(9).fillColor(INK);
  doc.text(`Pay ${money(document, document.balanceCents)} by card at this private link, or scan the code:`);
  // Small enough that the whole link stays on one line, so it can be copied from the PDF in one piece.
  doc.font(INTER).fontSize(7.5).fillColor(TEAL);
  doc.text(document.payUrl, { width: CONTENT_WIDTH, link: document.payUrl, underline: true });
  if (payQr) {
    doc.image(payQr, MARGIN, doc.y + 4, { width: QR_SIZE, height: QR_SIZE });
    doc.y += QR_SIZE + 4;
  }
  doc.y += 12;
  doc.x = MARGIN;
}

function drawNotes(doc: PDFKit.PDFDocument, document: InvoiceDocument): void {
  const { invoice, profile } = document;
  if (invoice.notes) {
    room(doc, 40);
    doc.font(INTER_BOLD).fontSize(10).fillColor(TEAL).text('Notes', MARGIN, doc.y);
    doc.font(INTER).fontSize(9).fillColor(INK).text(invoice.notes, { width: CONTENT_WIDTH });
    doc.moveDown();
  }
  if (invoice.status === 'void') {
    doc.font(INTER_BOLD).fontSize(9).fillColor('#a02020');
    doc.text(`Void: ${invoice.voidReason ?? 'no reason given'}. Nothing is owed on this invoice.`, {
      width: CONTENT_WIDTH,
    });
    doc.moveDown(0.5);
  }
  room(doc, 40);
  doc.font(INTER).fontSize(8).fillColor(GREY).text(taxNote(document), MARGIN, doc.y, { width: CONTENT_WIDTH });
  if (profile.invoiceFooter) {
    doc.moveDown(0.5).text(profile.invoiceFooter, { width: CONTENT_WIDTH, align: 'center' });
  }
}

/** A large, faint, tilted word across the first page, as a rubber stamp would sit. */
function drawStamp(doc: PDFKit.PDFDocument, { invoice }: InvoiceDocument): void {
  const word = invoice.status === 'paid' ? 'PAID' : invoice.status === 'void' ? 'VOID' : null;
  if (!word) return;
  doc.switchToPage(0);
  const color = word === 'PAID' ? '#1f7a3a' : '#a02020';
  doc.save();
  doc.rotate(-18, { origin: [PAGE.width / 2, 330] });
  doc.font(INTER_BOLD).fontSize(72).fillColor(color).fillOpacity(0.18);
  doc.text(word, MARGIN, 290, { width: CONTENT_WIDTH, align: 'center', lineBreak: false });
  doc.restore();
}

import { formatMoney } from '@keenroute/shared';
import { INTER, INTER_BOLD } from '../../common/pdf/fonts';
import { COLOURS, CONTENT_WIDTH, PAGE, drawAddressee, drawLetterhead } from '../../common/pdf/letterhead';
import { renderToBuffer } from '../../common/pdf/render-to-buffer';
import type { BusinessProfile } from '../entities/business-profile.entity';
import type { StatementLedger } from './statement-ledger';

const MARGIN = PAGE.margin;
const DATE_WIDTH = 70;
const AMOUNT_WIDTH = 76;
const DESCRIPTION_WIDTH = CONTENT_WIDTH - DATE_WIDTH - 3 * AMOUNT_WIDTH;
const { grey: GREY, ink: INK } = COLOURS;

export interface StatementDocument {
  profile: BusinessProfile;
  logo: Buffer | null;
  account: { name: string; email: string | null; addressLines: string[] };
  currency: string;
  /** The day it was drawn up. */
  statementDate: string;
  ledger: StatementLedger;
}

/** What the closing balance means for the reader: owed, in credit, or settled. */
export function closingLabel(closingCents: number): string {
  if (closingCents > 0) return 'Balance due';
  if (closingCents < 0) return 'In credit';
  return 'Balance';
}

/**
 * A statement of account: the business at the top, whose account and which days, a summary (opening balance, what
 * was invoiced, paid and credited, closing balance), then every entry of the period with the running balance.
 */
export function renderStatementPdf(document: StatementDocument): Promise<Buffer> {
  const options: PDFKit.PDFDocumentOptions = {
    size: 'LETTER',
    margin: MARGIN,
    info: {
      Title: `Statement ${document.ledger.from} to ${document.ledger.to} – ${document.account.name}`,
      Creator: 'Keenroute',
    },
  };
  return renderToBuffer(options, (doc) => {
    drawLetterhead(doc, document.profile, document.logo);
    drawAccount(doc, document);
    drawSummary(doc, document);
    drawEntries(doc, document);
    drawNotes(doc, document);
  });
}

function drawAccount(doc: PDFKit.PDFDocument, { account, ledger, statementDate, currency }: StatementDocument): void {
  drawAddressee(doc, {
    title: 'Statement of account',
    label: 'Account',
    name: account.name,
    lines: account.addressLines,
    email: account.email,
    facts: [
      ['Statement date', statementDate],
      ['Period', `${ledger.from} to ${ledger.to}`],
      ['Currency', currency],
    ],
    factLabelWidth: 90,
  });
}

function drawSummary(doc: PDFKit.PDFDocument, { ledger, currency }: StatementDocument): void {
  const money = (cents: number) => formatMoney(cents, currency);
  const { totals } = ledger;
  const rows: { label: string; cents: number; strong?: boolean }[] = [
    { label: `Opening balance on ${ledger.from}`, cents: ledger.openingCents },
    { label: 'Invoiced', cents: totals.invoicedCents },
    ...(totals.refundedCents ? [{ label: 'Refunds paid out', cents: totals.refundedCents }] : []),
    { label: 'Payments received', cents: -totals.paidCents },
    { label: 'Credit notes', cents: -totals.creditedCents },
    ...(totals.voidedCents ? [{ label: 'Invoices voided', cents: -totals.voidedCents }] : []),
    { label: `${closingLabel(ledger.closingCents)} on ${ledger.to}`, cents: ledger.closingCents, strong: true },
  ];
  const labelX = MARGIN + CONTENT_WIDTH - AMOUNT_WIDTH - 260;
  for (const row of rows) {
    const y = doc.y;
    doc
      .font(row.strong ? INTER_BOLD : INTER)
      .fontSize(row.strong ? 11 : 10)
      .fillColor(INK);
    doc.text(row.label, labelX, y, { width: 252, align: 'right' });
    doc.text(money(row.cents), MARGIN + CONTENT_WIDTH - AMOUNT_WIDTH, y, { width: AMOUNT_WIDTH, align: 'right' });
    doc.y += 2;
  }
  doc.x = MARGIN;
  doc.moveDown(1.5);
}

function drawEntries(doc: PDFKit.PDFDocument, { ledger, currency }: StatementDocument): void {
  const money = (cents: number) => formatMoney(cents, currency);
  const chargeX = MARGIN + DATE_WIDTH + DESCRIPTION_WIDTH;
  const creditX = chargeX + AMOUNT_WIDTH;
  const balanceX = creditX + AMOUNT_WIDTH;
  const header = () => {
    const y = doc.y;
    doc.font(INTER_BOLD).fontSize(9).fillColor(GREY);
    doc.text('Date', MARGIN, y, { width: DATE_WIDTH });
    doc.text('Description', MARGIN + DATE_WIDTH, y, { width: DESCRIPTION_WIDTH });
    doc.text('Charges', chargeX, y, { width: AMOUNT_WIDTH, align: 'right' });
    doc.text('Credits', creditX, y, { width: AMOUNT_WIDTH, align: 'right' });
    doc.text('Balance', balanceX, y, { width: AMOUNT_WIDTH, align: 'right' });
    doc
      .moveTo(MARGIN, doc.y + 2)
      .lineTo(MARGIN + CONTENT_WIDTH, doc.y + 2)
      .strokeColor(GREY)
      .lineWidth(0.5)
      .stroke();
    doc.y += 6;
  };
  const row = (day: string, description: string, charge: string, credit: string, balance: string, bold = false) => {
    doc.font(bold ? INTER_BOLD : INTER).fontSize(9);
    const height = doc.heightOfString(description, { width: DESCRIPTION_WIDTH - 8 });
    if (doc.y + height > doc.page.height - MARGIN) {
      doc.addPage();
      header();
      doc.font(bold ? INTER_BOLD : INTER).fontSize(9);
    }
    const y = doc.y;
    doc.fillColor(INK).text(day, MARGIN, y, { width: DATE_WIDTH });
    doc.text(description, MARGIN + DATE_WIDTH, y, { width: DESCRIPTION_WIDTH - 8 });
    const bottom = doc.y;
    doc.text(charge, chargeX, y, { width: AMOUNT_WIDTH, align: 'right' });
    doc.text(credit, creditX, y, { width: AMOUNT_WIDTH, align: 'right' });
    doc.text(balance, balanceX, y, { width: AMOUNT_WIDTH, align: 'right' });
    doc.y = bottom + 4;
  };
  header();
  row(ledger.from, 'Opening balance', '', '', money(ledger.openingCents), true);
  for (const entry of ledger.rows) {
    row(
      entry.day,
      entry.description,
      entry.chargeCents ? money(entry.chargeCents) : '',
      entry.creditCents ? money(entry.creditCents) : '',
      money(entry.balanceCents),
    );
  }
  if (ledger.rows.length === 0) row('', 'Nothing was invoiced, paid or credited in this period.', '', '', '');
  row(ledger.to, 'Closing balance', '', '', money(ledger.closingCents), true);
  doc.x = MARGIN;
  doc.moveDown();
}

function drawNotes(doc: PDFKit.PDFDocument, { profile }: StatementDocument): void {
  if (doc.y + 40 > doc.page.height - MARGIN) doc.addPage();
  doc.font(INTER).fontSize(8).fillColor(GREY);
  doc.text(
    'Charges are invoices issued and refunds paid out; credits are payments received, credit notes and voided ' +
      'invoices. A payment taken on site before its invoice was issued counts from the issue date.',
    MARGIN,
    doc.y,
    { width: CONTENT_WIDTH },
  );
  if (profile.invoiceFooter) doc.moveDown(0.5).text(profile.invoiceFooter, { width: CONTENT_WIDTH, align: 'center' });
}

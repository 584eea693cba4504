import { formatMoney } from '@keenroute/shared';
import type { InvoiceDocument } from '../documents/invoice-document';
import { businessSignature, escapeHtml, type InvoiceMailText } from '../documents/invoice-mail';

export interface ReminderFacts {
  /** Whole days past the due date on the day the reminder goes out. */
  daysOverdue: number;
  /** The business's last configured stage: the wording asks a little more firmly. */
  final: boolean;
}

const dayCount = (days: number) => (days === 1 ? '1 day' : `${days} days`);

/**
 * A reminder for an overdue invoice: how much is still owed and since when, thanks for any part already paid, the pay
 * link, and the invoice attached again. Polite throughout; a payment made in the last few days may cross it.
 */
export function reminderMail(document: InvoiceDocument, facts: ReminderFacts): InvoiceMailText {
  const { invoice, profile } = document;
  const money = (cents: number) => formatMoney(cents, invoice.currency);
  const number = invoice.number ?? '';
  const overdue = dayCount(facts.daysOverdue);
  const owed =
    `Invoice ${number} for ${money(invoice.totalCents)} was due on ${invoice.dueDate ?? '–'}, ` +
    `${overdue} ago. ${money(document.balanceCents)} is still owed on it.`;
  const received = invoice.paidCents + invoice.creditedCents;
  const thanks = received > 0 ? `Thank you for the ${money(received)} already received or credited.` : null;
  const ask = facts.final
    ? 'This is our last reminder for this invoice: please pay it, or reply and tell us what is holding it up.'
    : 'When you have a moment, please pay the balance.';
  const payLine = document.payUrl ? 'Pay online by card at this private link:' : null;
  const attached = 'The invoice is attached again as a PDF.';
  const crossed = 'If you paid in the last few days, thank you, and please ignore this reminder.';
  const signature = businessSignature(profile);

  const text = [
    `Hello ${invoice.billToName},`,
    '',
    owed,
    ...(thanks ? [thanks] : []),
    ask,
    ...(document.payUrl ? ['', payLine!, document.payUrl] : []),
    '',
    attached,
    crossed,
    '',
    '-- ',
    ...signature,
  ].join('\n');
  const html = [
    `<p>Hello ${escapeHtml(invoice.billToName)},</p>`,
    `<p><strong>${escapeHtml(owed)}</strong>${thanks ? `<br>${escapeHtml(thanks)}` : ''}</p>`,
    `<p>${escapeHtml(ask)}</p>`,
    ...(document.payUrl
      ? [`<p>${payLine}<br><a href="${escapeHtml(document.payUrl)}">${escapeHtml(document.payUrl)}</a></p>`]
      : []),
    `<p>${escapeHtml(attached)} ${escapeHtml(crossed)}</p>`,
    `<p style="color:#666">${signature.map(escapeHtml).join('<br>')}</p>`,
  ].join('\n');
  const subject = facts.final
    ? `Final reminder: invoice ${number} is ${overdue} overdue`
    : `Reminder: invoice ${number} is ${overdue} overdue`;
  return { subject, text, html };
}

import { formatMoney } from '@keenroute/shared';
import type { InvoiceDocument } from './invoice-document';

const DEMO_NOTE = 'Keenroute (demo business: the people and places in this demo are invented)';

export const escapeHtml = (text: string) =>
  text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

export interface InvoiceMailText {
  subject: string;
  text: string;
  html: string;
}

/** The business as a mail signs off: its name, and how to reach it when that is set. */
export function businessSignature(profile: InvoiceDocument['profile']): string[] {
  return [profile.name || 'Keenroute', [profile.phone, profile.email].filter(Boolean).join(' · ')].filter(Boolean);
}

/** The e-mail an invoice goes out with: what it is for, when it is due, and the pay link while something is owed. */
export function invoiceMail(document: InvoiceDocument): InvoiceMailText {
  const { invoice, profile } = document;
  const money = (cents: number) => formatMoney(cents, invoice.currency);
  const business = profile.name || 'Keenroute';
  const number = invoice.number ?? 'draft';
  const summary =
    `Attached is invoice ${number} for ${money(invoice.totalCents)}` +
    (invoice.issueDate ? `, issued ${invoice.issueDate}` : '') +
    (invoice.dueDate ? ` and due ${invoice.dueDate}` : '') +
    '.';
  const standing =
    invoice.status === 'paid'
      ? 'It is paid in full: thank you.'
      : invoice.status === 'void'
        ? 'This invoice is void: nothing is owed on it.'
        : `Balance due: ${money(document.balanceCents)}.`;
  const payLine = document.payUrl ? 'Pay online by card at this private link:' : null;
  const questions = 'Questions about this invoice? Reply to this message.';
  const signature = businessSignature(profile);

  const text = [
    `Hello ${invoice.billToName},`,
    '',
    summary,
    standing,
    ...(document.payUrl ? ['', payLine!, document.payUrl] : []),
    '',
    questions,
    '',
    '-- ',
    ...signature,
    DEMO_NOTE,
  ].join('\n');
  const html = [
    `<p>Hello ${escapeHtml(invoice.billToName)},</p>`,
    `<p>${escapeHtml(summary)}<br><strong>${escapeHtml(standing)}</strong></p>`,
    ...(document.payUrl
      ? [`<p>${payLine}<br><a href="${escapeHtml(document.payUrl)}">${escapeHtml(document.payUrl)}</a></p>`]
      : []),
    `<p>${escapeHtml(questions)}</p>`,
    `<p style="color:#666">${signature.map(escapeHtml).join('<br>')}<br><small>${escapeHtml(DEMO_NOTE)}</small></p>`,
  ].join('\n');
  return { subject: `Invoice ${number} from ${business}`, text, html };
}

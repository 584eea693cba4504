import { formatMoney } from '@keenroute/shared';
import type { PaymentMethod } from '../entities/payment.entity';

export interface ReceiptContent {
  businessName: string;
  billToName: string;
  invoiceNumber: string;
  currency: string;
  amountCents: number;
  method: PaymentMethod;
  reference: string;
  receivedAt: Date;
  timeZone: string;
  totalCents: number;
  paidCents: number;
  balanceCents: number;
  /** The invoice's pay link while something is still owed; null when it is settled. */
  payUrl: string | null;
}

const METHOD_LABELS: Record<PaymentMethod, string> = {
  cash: 'cash',
  cheque: 'cheque',
  'card-terminal': 'card (terminal)',
  online: 'card, online',
};

const escapeHtml = (text: string) =>
  text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

/** The receipt for one payment on an invoice: what came in, how, and what is still owed. */
export function receiptMail(content: ReceiptContent): { subject: string; text: string; html: string } {
  const money = (cents: number) => formatMoney(cents, content.currency);
  const day = new Intl.DateTimeFormat('en-US', { dateStyle: 'long', timeZone: content.timeZone }).format(
    content.receivedAt,
  );
  const how = content.reference
    ? `${METHOD_LABELS[content.method]}, reference ${content.reference}`
    : METHOD_LABELS[content.method];
  const received = `We received ${money(content.amountCents)} (${how}) on ${day} for invoice ${content.invoiceNumber}.`;
  const standing =
    content.balanceCents > 0
      ? `Invoice total ${money(content.totalCents)}, paid so far ${money(content.paidCents)}, balance due ${money(content.balanceCents)}.`
      : `Invoice ${content.invoiceNumber} is paid in full.`;
  const signature = content.businessName || 'Keenroute';
  const text = [
    `Hello ${content.billToName},`,
    '',
    received,
    standing,
    ...(content.payUrl ? ['', 'Pay the balance online:', content.payUrl] : []),
    '',
    'Thank you.',
    '',
    '-- ',
    signature,
  ].join('\n');
  const html = [
    `<p>Hello ${escapeHtml(content.billToName)},</p>`,
    `<p>${escapeHtml(received)}<br>${escapeHtml(standing)}</p>`,
    content.payUrl ? `<p><a href="${escapeHtml(content.payUrl)}">Pay the balance online</a></p>` : '',
    '<p>Thank you.</p>',
    `<p style="color:#666">${escapeHtml(signature)}</p>`,
  ].join('\n');
  return { subject: `Receipt for ${money(content.amountCents)}: invoice ${content.invoiceNumber}`, text, html };
}

import { formatMoney } from '@keenroute/shared';
import type { InvoiceStatus, PaymentMethod, RefundMethod } from './types';

// Words for the person who pays: "sent" is the office's view of an invoice; to its payer it is unpaid.
export const STATUS_LABELS: Record<InvoiceStatus, string> = {
  draft: 'Draft',
  sent: 'Unpaid',
  'part-paid': 'Part paid',
  paid: 'Paid',
  void: 'Void',
};

export const STATUS_COLORS: Record<InvoiceStatus, string> = {
  draft: 'gray',
  sent: 'keenTeal',
  'part-paid': 'brass',
  paid: 'green',
  void: 'gray',
};

export const PAYMENT_METHOD_LABELS: Record<PaymentMethod, string> = {
  cash: 'Cash',
  cheque: 'Cheque',
  'card-terminal': 'Card (at the stop)',
  online: 'Paid online',
};

export const REFUND_METHOD_LABELS: Record<RefundMethod, string> = {
  none: 'Credit on the invoice',
  cash: 'Refunded in cash',
  cheque: 'Refunded by cheque',
  'card-terminal': 'Refunded to the card',
  online: 'Refunded online',
};

export function money(cents: number, currency: string): string {
  return formatMoney(cents, currency);
}

/** Still something to pay on an issued invoice; the server's canPayOnline / payUrl decide whether online works. */
export function isOwed(invoice: { status: InvoiceStatus; balanceCents: number }): boolean {
  return (invoice.status === 'sent' || invoice.status === 'part-paid') && invoice.balanceCents > 0;
}

/**
 * The public invoice names no discount, but its total is lines − discount + tax, so what is left is the discount.
 * Zero (or a rounding oddity below zero) shows no discount row.
 */
export function discountFrom(invoice: { lines: { amountCents: number }[]; taxCents: number; totalCents: number }) {
  const lines = invoice.lines.reduce((sum, line) => sum + line.amountCents, 0);
  return Math.max(0, lines + invoice.taxCents - invoice.totalCents);
}

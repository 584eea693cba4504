import { DEFAULT_CURRENCY, formatBasisPoints, formatMoney } from '@keenroute/shared';
import type { InvoiceMail, InvoicePaymentMethod, InvoiceStatus, InvoiceSummary, RefundMethod } from './types';

export const INVOICE_STATUS_LABELS: Readonly<Record<InvoiceStatus, string>> = {
  draft: 'Draft',
  sent: 'Sent',
  'part-paid': 'Part paid',
  paid: 'Paid',
  void: 'Void',
};

export const INVOICE_STATUS_COLORS: Readonly<Record<InvoiceStatus, string>> = {
  draft: 'gray',
  sent: 'keenTeal',
  'part-paid': 'brass',
  paid: 'green',
  void: 'dark',
};

export const PAYMENT_METHOD_LABELS: Readonly<Record<InvoicePaymentMethod, string>> = {
  cash: 'Cash',
  cheque: 'Cheque',
  'card-terminal': 'Card on the terminal',
  online: 'Paid online',
};

export const REFUND_METHOD_LABELS: Readonly<Record<RefundMethod, string>> = {
  none: 'No refund: it only lowers what is owed',
  cash: 'Refunded in cash',
  cheque: 'Refunded by cheque',
  'card-terminal': 'Refunded on the card terminal',
  online: 'Refunded online, through the payment service',
};

export const MAIL_KIND_LABELS: Readonly<Record<InvoiceMail['kind'], string>> = {
  invoice: 'Invoice',
  reminder: 'Reminder',
  receipt: 'Receipt',
  statement: 'Statement',
};

export function money(cents: number, currency: string = DEFAULT_CURRENCY): string {
  return formatMoney(cents, currency || DEFAULT_CURRENCY);
}

/** "8.25%" for a tax rate or discount in basis points. */
export function percent(basisPoints: number): string {
  return formatBasisPoints(basisPoints);
}

/** The number people quote, or what a draft is called until it has one. */
export function invoiceTitle(invoice: Pick<InvoiceSummary, 'number'>): string {
  return invoice.number ? `Invoice ${invoice.number}` : 'Draft invoice';
}

export function overdueWords(days: number): string {
  if (days <= 0) return 'Overdue';
  return days === 1 ? '1 day overdue' : `${days} days overdue`;
}

/** The PDF's file name, as the server names it: KR-2026-0001.pdf. */
export function pdfFileName(invoice: Pick<InvoiceSummary, 'number' | 'id'>): string {
  return invoice.number ? `${invoice.number}.pdf` : `draft-invoice-${invoice.id.slice(0, 8)}.pdf`;
}

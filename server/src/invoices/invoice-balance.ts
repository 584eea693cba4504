import type { InvoiceStatus } from './entities/invoice.entity';

export interface InvoiceAmounts {
  status: InvoiceStatus;
  totalCents: number;
  paidCents: number;
  creditedCents: number;
  dueDate: string | null;
}

/** What is still owed: the total less payments and credit notes (never below zero; an overpayment is a refund's matter). */
export const balanceCents = (invoice: Pick<InvoiceAmounts, 'totalCents' | 'paidCents' | 'creditedCents'>) =>
  Math.max(0, invoice.totalCents - invoice.paidCents - invoice.creditedCents);

/**
 * The status that follows from the money: a draft stays a draft and a void stays void; otherwise paid when nothing is
 * owed, part-paid when something came in, sent when nothing did.
 */
export function statusFromMoney(invoice: InvoiceAmounts): InvoiceStatus {
  if (invoice.status === 'draft' || invoice.status === 'void') return invoice.status;
  if (balanceCents(invoice) === 0) return 'paid';
  return invoice.paidCents + invoice.creditedCents > 0 ? 'part-paid' : 'sent';
}

/** Overdue is derived, never stored: issued, not settled, and the due date is before today (business time zone). */
export function isOverdue(invoice: InvoiceAmounts, today: string): boolean {
  return (
    (invoice.status === 'sent' || invoice.status === 'part-paid') &&
    invoice.dueDate !== null &&
    invoice.dueDate < today &&
    balanceCents(invoice) > 0
  );
}

/** Whole days from the due date to today (0 when not yet due). */
export function daysOverdue(dueDate: string, today: string): number {
  const days = (Date.parse(`${today}T00:00:00Z`) - Date.parse(`${dueDate}T00:00:00Z`)) / 86_400_000;
  return Math.max(0, Math.round(days));
}

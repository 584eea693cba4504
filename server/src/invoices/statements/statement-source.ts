import type { EntityManager } from 'typeorm';
import type { PaymentMethod } from '../../payments/entities/payment.entity';
import type { RefundMethod } from '../entities/credit-note.entity';
import type { LedgerEntry } from './statement-ledger';

/** Whose statement: the invoices billed to one customer, or to one stop that pays for its people. */
export interface StatementAccount {
  kind: 'customer' | 'stop';
  id: string;
}

/** How money came in, and how a refund went back: the same four ways. */
export const METHOD_LABELS: Readonly<Record<PaymentMethod, string>> = {
  cash: 'cash',
  cheque: 'cheque',
  'card-terminal': 'card terminal',
  online: 'online',
};

interface InvoiceRow {
  number: string;
  issueDay: string;
  dueDay: string | null;
  totalCents: number;
  creditedCents: number;
  status: string;
  voidDay: string | null;
  voidReason: string | null;
  at: Date;
  voidedAt: Date | null;
}

interface PaymentRow {
  number: string;
  issueDay: string;
  day: string;
  method: PaymentMethod;
  reference: string;
  amountCents: number;
  onSite: boolean;
  at: Date;
}

interface CreditRow {
  number: string;
  invoiceNumber: string;
  day: string;
  amountCents: number;
  reason: string;
  refundMethod: RefundMethod;
  at: Date;
}

const OF_ACCOUNT = (account: StatementAccount) =>
  account.kind === 'customer'
    ? `i.bill_to = 'customer' AND i.customer_id = $1`
    : `i.bill_to = 'stop' AND i.stop_id = $1`;

/**
 * Every entry on an account up to `to`, read from the rows (never from the invoices' running totals): each issued
 * invoice, the payments and credit notes against it, refunds paid out, and a void as the reversal of what was still
 * charged. Days are in the business's time zone. An on-site payment taken before its invoice existed counts from the
 * invoice's issue date (its own date stays in the description), so an opening balance never shows money paid
 * against a charge that was not on the account yet.
 */
export async function loadStatementEntries(
  manager: EntityManager,
  account: StatementAccount,
  currency: string,
  to: string,
  timeZone: string,
): Promise<LedgerEntry[]> {
  const where = `${OF_ACCOUNT(account)} AND i.status <> 'draft' AND i.number IS NOT NULL AND i.currency = $2
                 AND i.issue_date <= $3::date`;
  const params = [account.id, currency, to, timeZone];
  const dayOf = (column: string) => `to_char(${column} AT TIME ZONE $4, 'YYYY-MM-DD')`;
  const [invoices, payments, credits] = await Promise.all([
    manager.query<InvoiceRow[]>(
      `SELECT i.number, to_char(i.issue_date, 'YYYY-MM-DD') AS "issueDay", to_char(i.due_date, 'YYYY-MM-DD') AS "dueDay",
              i.total_cents AS "totalCents", i.credited_cents AS "creditedCents", i.status,
              ${dayOf('i.voided_at')} AS "voidDay", i.void_reason AS "voidReason", i.created_at AS at,
              i.voided_at AS "voidedAt"
         FROM invoices i WHERE ${where}`,
      params,
    ),
    manager.query<PaymentRow[]>(
      `SELECT i.number, to_char(i.issue_date, 'YYYY-MM-DD') AS "issueDay", ${dayOf('p.recorded_at')} AS day,
              p.method, p.reference, p.amount_cents AS "amountCents", p.ticket_id IS NOT NULL AS "onSite",
              p.recorded_at AS at
         FROM payments p JOIN invoices i ON i.id = p.invoice_id WHERE ${where}`,
      params,
    ),
    manager.query<CreditRow[]>(
      `SELECT c.number, i.number AS "invoiceNumber", ${dayOf('c.created_at')} AS day, c.amount_cents AS "amountCents",
              c.reason, c.refund_method AS "refundMethod", c.created_at AS at
         FROM credit_notes c JOIN invoices i ON i.id = c.invoice_id WHERE ${where}`,
      params,
    ),
  ]);
  const entries: LedgerEntry[] = [];
  for (const invoice of invoices) {
    entries.push({
      kind: 'invoice',
      day: invoice.issueDay,
      description: `Invoice ${invoice.number}` + (invoice.dueDay ? `, due ${invoice.dueDay}` : ''),
      chargeCents: invoice.totalCents,
      creditCents: 0,
      at: invoice.at.getTime(),
    });
    if (invoice.status === 'void' && invoice.voidDay) {
      entries.push({
        kind: 'void',
        day: invoice.voidDay,
        description: `Invoice ${invoice.number} void` + (invoice.voidReason ? `: ${invoice.voidReason}` : ''),
        chargeCents: 0,
        creditCents: Math.max(0, invoice.totalCents - invoice.creditedCents),
        at: (invoice.voidedAt ?? invoice.at).getTime(),
      });
    }
  }
  for (const payment of payments) {
    const taken = payment.onSite ? `on site ${payment.day}` : '';
    const details = [METHOD_LABELS[payment.method], taken, payment.reference ? `ref. ${payment.reference}` : '']
      .filter(Boolean)
      .join(', ');
    entries.push({
      kind: 'payment',
      day: payment.day < payment.issueDay ? payment.issueDay : payment.day,
      description: `Payment on ${payment.number} (${details})`,
      chargeCents: 0,
      creditCents: payment.amountCents,
      at: payment.at.getTime(),
    });
  }
  for (const credit of credits) {
    entries.push({
      kind: 'credit-note',
      day: credit.day,
      description: `Credit note ${credit.number} on ${credit.invoiceNumber}: ${credit.reason}`,
      chargeCents: 0,
      creditCents: credit.amountCents,
      at: credit.at.getTime(),
    });
    // A credit note that sent the money back leaves the account where it was: the refund is a charge again.
    if (credit.refundMethod !== 'none') {
      entries.push({
        kind: 'refund',
        day: credit.day,
        description: `Refund by ${METHOD_LABELS[credit.refundMethod]} for ${credit.number}`,
        chargeCents: credit.amountCents,
        creditCents: 0,
        at: credit.at.getTime(),
      });
    }
  }
  return entries;
}

/** The currencies the account's issued invoices are in, most used first. */
export async function accountCurrencies(manager: EntityManager, account: StatementAccount): Promise<string[]> {
  const rows = await manager.query<{ currency: string }[]>(
    `SELECT i.currency FROM invoices i WHERE ${OF_ACCOUNT(account)} AND i.status <> 'draft'
      GROUP BY i.currency ORDER BY count(*) DESC, i.currency`,
    [account.id],
  );
  return rows.map((row) => row.currency);
}

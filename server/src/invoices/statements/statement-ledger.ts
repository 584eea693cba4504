/** What moves an account's balance: charges raise it (invoices, refunds paid out), credits lower it. */
export const ENTRY_KINDS = ['invoice', 'payment', 'credit-note', 'refund', 'void'] as const;
export type EntryKind = (typeof ENTRY_KINDS)[number];

export interface LedgerEntry {
  kind: EntryKind;
  /** The business-time-zone day it counts on, YYYY-MM-DD. */
  day: string;
  description: string;
  chargeCents: number;
  creditCents: number;
  /** The moment it was recorded: orders entries of the same kind on the same day. */
  at: number;
}

export interface StatementRow extends LedgerEntry {
  /** The account's balance after this entry. */
  balanceCents: number;
}

export interface StatementTotals {
  invoicedCents: number;
  refundedCents: number;
  paidCents: number;
  creditedCents: number;
  voidedCents: number;
}

export interface StatementLedger {
  from: string;
  to: string;
  openingCents: number;
  rows: StatementRow[];
  totals: StatementTotals;
  closingCents: number;
}

/** On one day the invoice comes first, then what was paid or credited against it, then a void. */
const KIND_ORDER: Readonly<Record<EntryKind, number>> = {
  invoice: 0,
  payment: 1,
  'credit-note': 2,
  refund: 3,
  void: 4,
};

const TOTAL_OF: Readonly<Record<EntryKind, keyof StatementTotals>> = {
  invoice: 'invoicedCents',
  refund: 'refundedCents',
  payment: 'paidCents',
  'credit-note': 'creditedCents',
  void: 'voidedCents',
};

const net = (entry: LedgerEntry) => entry.chargeCents - entry.creditCents;

export function compareEntries(a: LedgerEntry, b: LedgerEntry): number {
  return a.day.localeCompare(b.day) || KIND_ORDER[a.kind] - KIND_ORDER[b.kind] || a.at - b.at;
}

/**
 * A statement of account for the days from..to (both included): the opening balance is everything before `from`,
 * each entry in the period is listed with the running balance, and the closing balance is the opening plus the
 * period's entries. Entries after `to` are left out, so a statement for a past month reads the same later on.
 */
export function buildStatement(entries: readonly LedgerEntry[], from: string, to: string): StatementLedger {
  const sorted = [...entries].sort(compareEntries);
  const openingCents = sorted.filter((entry) => entry.day < from).reduce((sum, entry) => sum + net(entry), 0);
  const totals: StatementTotals = {
    invoicedCents: 0,
    refundedCents: 0,
    paidCents: 0,
    creditedCents: 0,
    voidedCents: 0,
  };
  let balance = openingCents;
  const rows: StatementRow[] = [];
  for (const entry of sorted.filter((e) => e.day >= from && e.day <= to)) {
    balance += net(entry);
    totals[TOTAL_OF[entry.kind]] += entry.chargeCents + entry.creditCents;
    rows.push({ ...entry, balanceCents: balance });
  }
  return { from, to, openingCents, rows, totals, closingCents: balance };
}

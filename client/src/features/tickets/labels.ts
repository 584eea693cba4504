import {
  DEFAULT_CURRENCY,
  EDGE_TYPE_LABELS,
  TOOL_KIND_LABELS,
  formatLength,
  formatMoney,
  type EdgeType,
  type ToolKind,
} from '@keenroute/shared';
import type {
  BenchStatus,
  ExpectedShears,
  PaymentMethod,
  Settlement,
  Ticket,
  TicketKind,
  TicketShear,
  TicketStatus,
} from './types';

export const BENCH_STATUS_LABELS: Readonly<Record<BenchStatus, string>> = {
  waiting: 'Waiting',
  'on-the-bench': 'On the bench',
  ready: 'Ready',
  'handed-back': 'Handed back',
};

export const TICKET_STATUS_LABELS: Readonly<Record<TicketStatus, string>> = {
  open: 'Open',
  finished: 'Finished',
  'handed-back': 'Handed back',
};

export const TICKET_STATUS_COLORS: Readonly<Record<TicketStatus, string>> = {
  open: 'brass',
  finished: 'keenTeal',
  'handed-back': 'gray',
};

export const TICKET_KIND_LABELS: Readonly<Record<TicketKind, string>> = {
  visit: 'Visit',
  'walk-up': 'Walk-up',
  'drop-off': 'Drop-off',
};

export const SETTLEMENT_LABELS: Readonly<Record<Settlement, string>> = {
  unpaid: 'Not paid yet',
  'paid-on-site': 'Paid on site',
  'to-invoice': 'Left for an invoice',
};

export const PAYMENT_METHOD_LABELS: Readonly<Record<PaymentMethod, string>> = {
  cash: 'Cash',
  cheque: 'Cheque',
  'card-terminal': 'Card on the terminal',
};

/** "convex straight" as the trade says a kind of pair. */
export function kindWords(edgeType: EdgeType, toolKind: ToolKind): string {
  return `${EDGE_TYPE_LABELS[edgeType]} ${TOOL_KIND_LABELS[toolKind]}`;
}

/** "2 × convex straight, 1 × beveled thinning". */
export function expectedWords(expected: readonly ExpectedShears[]): string {
  return expected.map((item) => `${item.count} × ${kindWords(item.edgeType, item.toolKind)}`).join(', ');
}

/** "Demo Forge Cobalt 65, 6.5 in, convex straight". */
export function shearWords(shear: TicketShear): string {
  const name = [shear.make, shear.model].filter(Boolean).join(' ') || 'Make not recorded';
  return `${name}, ${formatLength(shear.lengthIn)}, ${kindWords(shear.edgeType, shear.toolKind)}`;
}

export function currencyOf(ticket: Pick<Ticket, 'price'>): string {
  return ticket.price.currency || DEFAULT_CURRENCY;
}

export function money(cents: number, currency: string = DEFAULT_CURRENCY): string {
  return formatMoney(cents, currency);
}

/** What is still owed on the ticket after the payments recorded so far, never below zero. */
export function dueCents(ticket: Pick<Ticket, 'price' | 'payments' | 'balanceCents'>): number {
  if (ticket.balanceCents !== undefined) return Math.max(0, ticket.balanceCents);
  const paid = ticket.payments.reduce((sum, payment) => sum + payment.amountCents, 0);
  return Math.max(0, ticket.price.totalCents - paid);
}

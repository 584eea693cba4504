/**
 * The history's invoices: the tickets left for an invoice, gathered per payer (the customer, or the stop where the
 * stop pays) and week, issued the Monday after, priced by the rules package as the invoice drafts are
 * (invoiceLinesFromTicket, priceInvoice), numbered without gaps per year in the app's KR-2025-0001 form. One was sent
 * to the wrong address and is void, issued again the next day.
 */
import { randomUUID } from 'node:crypto';
import { addDays, dueDate, invoiceLinesFromTicket, weekStart } from '@keenroute/shared';
import type { InvoiceLine } from '../../../invoices/entities/invoice-line.entity';
import type { BillToSnapshot } from '../../../invoices/invoice-bill-to';
import { adjustmentLabel, priceFields, shearDescription, ticketLabel } from '../../../invoices/invoice-drafts';
import { formatDocumentNumber } from '../../../invoices/invoice-numbering';
import { addressLines, payerKey, payerOf, type Payer } from '../../../invoices/invoice-payer';
import type { DemoRandom } from '../demo-random';
import type { HistoryStop } from './history-source';
import type { PlannedTicket } from './history-tickets';

export interface PlannedInvoice {
  id: string;
  payer: Payer;
  snapshot: BillToSnapshot;
  tickets: PlannedTicket[];
  lines: Omit<InvoiceLine, 'invoiceId'>[];
  price: ReturnType<typeof priceFields>;
  currency: string;
  issueDate: string;
  dueDate: string;
  termsDays: number;
  number: string;
  void: { reason: string; on: string } | null;
}

export interface InvoiceBook {
  invoices: PlannedInvoice[];
  /** The last number taken per series and year, for document_counters. */
  counters: Map<string, number>;
}

const invoiceYear = (day: string) => Number(day.slice(0, 4));

function snapshotOf(payer: Payer, ticket: PlannedTicket): BillToSnapshot {
  const stop: HistoryStop = ticket.stop;
  if (payer.billTo === 'stop') {
    return {
      billToName: stop.name,
      billToEmail: stop.email,
      billToAddress: addressLines(stop).join('\n').slice(0, 500),
    };
  }
  // The customer's address is the stop where they were met ("c/o" the salon), as billToSnapshot takes it at issue.
  return {
    billToName: ticket.customer.name,
    billToEmail: ticket.customer.email,
    billToAddress: [`c/o ${stop.name}`, ...addressLines(stop)].join('\n').slice(0, 500),
  };
}

/** One invoice for these tickets (one payer), its lines and totals as InvoiceDrafts.create makes them. */
function invoiceFor(tickets: PlannedTicket[], payer: Payer, issueDate: string, termsDays: number): PlannedInvoice {
  const lines = tickets.flatMap((ticket) => {
    const label = ticketLabel(
      { visitDay: ticket.visit.day, stopId: ticket.stop.id },
      ticket.customer,
      new Map([[ticket.stop.id, ticket.stop]]),
    );
    return invoiceLinesFromTicket({
      label,
      lines: ticket.lines.map((line) => ({
        ticketLineId: line.id,
        description: shearDescription(line, line.shear),
        amountCents: line.overrideCents ?? line.priceCents,
      })),
      subtotalCents: ticket.totals.subtotalCents,
      taxRateBp: ticket.totals.taxRateBp,
      servicesTaxable: ticket.totals.servicesTaxable,
      adjustmentLabel: adjustmentLabel(ticket.totals.summary),
    }).map((line) => ({ ...line, ticketId: ticket.id }));
  });
  const currency = tickets[0]!.totals.currency;
  return {
    id: randomUUID(),
    payer,
    snapshot: snapshotOf(payer, tickets[0]!),
    tickets,
    lines: lines.map((line, position) => ({
      id: randomUUID(),
      ticketId: line.ticketId,
      ticketLineId: line.ticketLineId,
      position,
      kind: line.kind,
      description: line.description.slice(0, 500),
      amountCents: line.amountCents,
      taxable: line.taxable,
      taxRateBp: line.taxRateBp,
    })),
    price: priceFields(lines, { discountBp: 0, discountCents: 0, currency }),
    currency,
    issueDate,
    dueDate: dueDate(issueDate, termsDays),
    termsDays,
    number: '',
    void: null,
  };
}

export function buildInvoices(
  rng: DemoRandom,
  tickets: readonly PlannedTicket[],
  options: { end: string; termsDays: number; counters: ReadonlyMap<string, number> },
): InvoiceBook {
  const groups = new Map<string, { payer: Payer; tickets: PlannedTicket[] }>();
  for (const ticket of tickets) {
    if (ticket.settlement !== 'to-invoice') continue;
    const payer = payerOf({ customerId: ticket.customer.id, stopId: ticket.stop.id }, ticket.stop.billingMode);
    const key = `${payerKey(payer)}|${weekStart(ticket.visit.day)}`;
    const group = groups.get(key) ?? { payer, tickets: [] };
    group.tickets.push(ticket);
    groups.set(key, group);
  }
  const invoices = [...groups.values()].map(({ payer, tickets: billed }) => {
    const monday = addDays(weekStart(billed[0]!.visit.day), 7);
    return invoiceFor(billed, payer, monday < options.end ? monday : options.end, options.termsDays);
  });

  // One invoice went to the wrong e-mail address: voided the next day and issued again.
  const voidable = invoices.filter(
    (invoice) =>
      invoice.payer.billTo === 'customer' &&
      invoice.issueDate >= addDays(options.end, -240) &&
      invoice.issueDate <= addDays(options.end, -120),
  );
  let voided: { original: PlannedInvoice; again: PlannedInvoice } | null = null;
  if (voidable.length > 0) {
    const original = rng.pick(voidable);
    const again = invoiceFor(original.tickets, original.payer, addDays(original.issueDate, 1), options.termsDays);
    original.void = { reason: '', on: again.issueDate };
    invoices.push(again);
    voided = { original, again };
  }

  // Numbered in the order they were issued, each year from where the counter stood.
  const counters = new Map(options.counters);
  invoices.sort(
    (a, b) => a.issueDate.localeCompare(b.issueDate) || a.snapshot.billToName.localeCompare(b.snapshot.billToName),
  );
  for (const invoice of invoices) {
    const year = invoiceYear(invoice.issueDate);
    const next = (counters.get(`KR-${year}`) ?? 0) + 1;
    counters.set(`KR-${year}`, next);
    invoice.number = formatDocumentNumber('KR', year, next);
  }
  if (voided) {
    voided.original.void!.reason = `Sent to an old e-mail address by mistake; issued again as ${voided.again.number}.`;
  }
  return { invoices, counters };
}

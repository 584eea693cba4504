/** The history's plans as table rows, shaped as the ticket and invoice services write them. */
import { randomUUID } from 'node:crypto';
import type { Invoice } from '../../../invoices/entities/invoice.entity';
import type { ShearHistoryEntry } from '../../../shears/entities/shear-history-entry.entity';
import type { TicketLineOverride } from '../../../tickets/entities/ticket-line-override.entity';
import type { TicketLine } from '../../../tickets/entities/ticket-line.entity';
import type { Ticket } from '../../../tickets/entities/ticket.entity';
import { servicedSummary } from '../../../tickets/ticket-closing';
import type { BusinessClock } from './business-time';
import type { InvoiceMoney } from './history-collections';
import type { PlannedInvoice } from './history-invoices';
import type { PlannedTicket } from './history-tickets';

/** The route day a ticket was worked on, and when it was opened, finished and handed back. */
export interface TicketTimes {
  routeDayId: string;
  openedAt: Date;
  finishedAt: Date;
  handedBackAt: Date;
}

export interface TicketRows {
  tickets: Ticket[];
  lines: TicketLine[];
  overrides: TicketLineOverride[];
  /** New "serviced" history lines, one per ticket line without one in the registry. */
  serviced: ShearHistoryEntry[];
  /** Registry "serviced" lines that now have their ticket. */
  linked: { id: string; ticketId: string }[];
}

export function ticketRows(
  tickets: readonly PlannedTicket[],
  times: ReadonlyMap<string, TicketTimes>,
  invoiceOf: ReadonlyMap<string, string>,
  context: { rateCardVersion: number; ownerId: string },
): TicketRows {
  const rows: TicketRows = { tickets: [], lines: [], overrides: [], serviced: [], linked: [] };
  for (const ticket of tickets) {
    const { routeDayId, openedAt, finishedAt, handedBackAt } = times.get(ticket.id)!;
    rows.tickets.push({
      id: ticket.id,
      customerId: ticket.customer.id,
      stopId: ticket.stop.id,
      routeDayId,
      bookingId: null,
      kind: 'visit',
      status: 'handed-back',
      visitDay: ticket.visit.day,
      notes: '',
      expected: [],
      chargeTrip: ticket.chargeTrip,
      currency: ticket.totals.currency,
      taxRateBp: ticket.totals.taxRateBp,
      servicesTaxable: ticket.totals.servicesTaxable,
      rateCardVersion: context.rateCardVersion,
      rulesSubtotalCents: ticket.totals.rulesSubtotalCents,
      subtotalCents: ticket.totals.subtotalCents,
      taxCents: ticket.totals.taxCents,
      totalCents: ticket.totals.totalCents,
      shearCount: ticket.lines.length,
      priceSummary: ticket.totals.summary,
      settlement: ticket.settlement,
      invoiceId: invoiceOf.get(ticket.id) ?? null,
      openedBy: ticket.visit.sharpenerId,
      createdAt: openedAt,
      updatedAt: handedBackAt,
      finishedAt,
      handedBackAt,
    });
    ticket.lines.forEach((line, position) => {
      rows.lines.push({
        id: line.id,
        ticketId: ticket.id,
        shearId: line.shear.id,
        addOns: line.addOns,
        priceCents: line.priceCents,
        explanation: line.explanation.slice(0, 500),
        overrideCents: line.overrideCents,
        overrideReason: line.overrideReason,
        benchStatus: 'handed-back',
        notes: '',
        position,
        createdAt: openedAt,
        updatedAt: handedBackAt,
      });
      if (line.overrideCents !== null) {
        rows.overrides.push({
          id: randomUUID(),
          ticketId: ticket.id,
          ticketLineId: line.id,
          shearId: line.shear.id,
          fromCents: line.priceCents,
          toCents: line.overrideCents,
          reason: line.overrideReason!,
          byUser: context.ownerId,
          at: finishedAt,
        });
      }
      if (line.servicedEntryId) {
        rows.linked.push({ id: line.servicedEntryId, ticketId: ticket.id });
      } else {
        rows.serviced.push({
          id: randomUUID(),
          shearId: line.shear.id,
          happenedOn: ticket.visit.day,
          kind: 'serviced',
          summary: servicedSummary(line.shear, line.addOns),
          ticketId: ticket.id,
          recordedBy: ticket.visit.sharpenerId,
          createdAt: finishedAt,
        });
      }
    });
  }
  return rows;
}

export function invoiceRows(
  invoices: readonly PlannedInvoice[],
  money: ReadonlyMap<string, InvoiceMoney>,
  context: { officeId: string; clock: BusinessClock },
): Omit<Invoice, 'version'>[] {
  const { clock, officeId } = context;
  return invoices.map((invoice) => {
    const paid = money.get(invoice.id)!;
    const createdAt = clock.at(invoice.issueDate, 9 * 60);
    const voidedAt = invoice.void ? clock.at(invoice.void.on, 9 * 60 + 30) : null;
    const lastMoney = paid.lastMoneyOn ? clock.at(paid.lastMoneyOn, 16 * 60) : null;
    return {
      id: invoice.id,
      number: invoice.number,
      status: paid.status,
      billTo: invoice.payer.billTo,
      customerId: invoice.payer.customerId,
      stopId: invoice.payer.stopId,
      ...invoice.snapshot,
      currency: invoice.currency,
      issueDate: invoice.issueDate,
      dueDate: invoice.dueDate,
      termsDays: invoice.termsDays,
      discountBp: 0,
      discountCents: 0,
      ...invoice.price,
      paidCents: paid.paidCents,
      creditedCents: paid.creditedCents,
      notes: '',
      voidReason: invoice.void?.reason ?? null,
      voidedAt,
      voidedBy: invoice.void ? officeId : null,
      // E-mailed when issued where the payer has an address; otherwise handed over on paper at the next visit.
      sentAt: invoice.snapshot.billToEmail ? clock.at(invoice.issueDate, 9 * 60 + 5) : null,
      createdBy: officeId,
      createdAt,
      updatedAt: voidedAt ?? lastMoney ?? createdAt,
    };
  });
}

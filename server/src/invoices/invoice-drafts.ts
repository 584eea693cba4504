import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  ADD_ON_LABELS,
  describeShear,
  invoiceLinesFromTicket,
  priceInvoice,
  type InvoiceDiscountInput,
  type InvoiceLineDraft,
  type TicketForInvoice,
} from '@keenroute/shared';
import { In, type DataSource, type EntityManager } from 'typeorm';
import type { Actor } from '../auth/actor';
import { DomainError, notFound } from '../common/errors/domain-error';
import { Customer } from '../customers/entities/customer.entity';
import { Payment } from '../payments/entities/payment.entity';
import { Shear } from '../shears/entities/shear.entity';
import { Stop } from '../stops/entities/stop.entity';
import { TicketLine } from '../tickets/entities/ticket-line.entity';
import { Ticket } from '../tickets/entities/ticket.entity';
import type { CreateInvoiceDto, InvoiceTermsDto } from './dto/create-invoice.dto';
import type { UpdateInvoiceDto } from './dto/update-invoice.dto';
import { InvoiceLine } from './entities/invoice-line.entity';
import { Invoice } from './entities/invoice.entity';
import { lockInvoice } from './invoice-ledger';
import { billToSnapshot } from './invoice-bill-to';
import { payerKey, payerOf, type Payer } from './invoice-payer';

/** The part of an invoice the rules package prices: from its lines and the discount asked for. */
export function priceFields(
  lines: readonly Pick<InvoiceLine, 'amountCents' | 'taxable' | 'taxRateBp'>[],
  terms: {
    discountBp: number;
    discountCents: number;
    currency: string;
  },
) {
  const discount: InvoiceDiscountInput =
    terms.discountBp > 0
      ? { discountBp: terms.discountBp }
      : terms.discountCents > 0
        ? { discountCents: terms.discountCents }
        : null;
  const price = priceInvoice(lines, discount, terms.currency);
  return {
    linesCents: price.linesCents,
    discountTotalCents: price.discountCents,
    subtotalCents: price.subtotalCents,
    taxCents: price.taxCents,
    totalCents: price.totalCents,
    taxGroups: price.taxGroups,
  };
}

/** Drafts: made from finished tickets left for an invoice, re-priced on a change, deleted to release the tickets. */
@Injectable()
export class InvoiceDrafts {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  /** Returns the new draft's id. */
  async create(actor: Actor, dto: CreateInvoiceDto, manager?: EntityManager): Promise<string> {
    const terms = discountTerms(dto, { discountBp: 0, discountCents: 0 });
    const run = async (tx: EntityManager) => {
      const tickets = await lockTickets(tx, dto.ticketIds);
      const [customers, stops] = await Promise.all([
        tx.getRepository(Customer).findBy({ id: In([...new Set(tickets.map((t) => t.customerId))]) }),
        tx.getRepository(Stop).findBy({ id: In(tickets.flatMap((t) => (t.stopId ? [t.stopId] : []))) }),
      ]);
      const customerById = new Map(customers.map((customer) => [customer.id, customer]));
      const stopById = new Map(stops.map((stop) => [stop.id, stop]));
      const label = (ticket: Ticket) => ticketLabel(ticket, customerById.get(ticket.customerId)!, stopById);
      const payer = samePayer(tickets, stopById, label);
      for (const ticket of tickets) refuseUninvoiceable(ticket, label(ticket));
      const currency = tickets[0]!.currency;
      if (tickets.some((ticket) => ticket.currency !== currency)) {
        throw new DomainError('conflict', 'These tickets are in different currencies; invoice each currency apart.');
      }
      const lines = await invoiceLines(tx, tickets, label);
      const paid = await tx.getRepository(Payment).findBy({ ticketId: In(tickets.map((ticket) => ticket.id)) });
      const snapshot = await billToSnapshot(tx, payer);
      const invoices = tx.getRepository(Invoice);
      const invoice = await invoices.save(
        invoices.create({
          ...payer,
          ...snapshot,
          currency,
          ...terms,
          notes: dto.notes ?? '',
          ...priceFields(lines, { ...terms, currency }),
          // A preview until issue attaches the payments themselves: what was taken on site counts on the invoice.
          paidCents: paid.reduce((sum, payment) => sum + payment.amountCents, 0),
          createdBy: actor.id,
        }),
      );
      await tx.getRepository(InvoiceLine).insert(
        lines.map((line, position) => ({
          invoiceId: invoice.id,
          ticketId: line.ticketId,
          ticketLineId: line.ticketLineId,
          position,
          kind: line.kind,
          description: line.description.slice(0, 500),
          amountCents: line.amountCents,
          taxable: line.taxable,
          taxRateBp: line.taxRateBp,
        })),
      );
      await tx.getRepository(Ticket).update({ id: In(tickets.map((ticket) => ticket.id)) }, { invoiceId: invoice.id });
      return invoice.id;
    };
    return manager ? run(manager) : this.dataSource.transaction(run);
  }

  async update(id: string, dto: UpdateInvoiceDto): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const invoice = await lockInvoice(manager, id);
      refuseUnlessDraft(invoice, 'changed');
      if (dto.version !== invoice.version) {
        throw new DomainError('conflict', 'This invoice changed since you opened it; reload it and try again.');
      }
      const terms = discountTerms(dto, invoice);
      const lines = await manager.getRepository(InvoiceLine).findBy({ invoiceId: id });
      Object.assign(invoice, terms, priceFields(lines, { ...terms, currency: invoice.currency }));
      if (dto.notes !== undefined) invoice.notes = dto.notes;
      await manager.getRepository(Invoice).save(invoice);
    });
  }

  async remove(id: string): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const invoice = await lockInvoice(manager, id);
      refuseUnlessDraft(invoice, 'deleted');
      await manager.getRepository(Ticket).update({ invoiceId: id }, { invoiceId: null });
      await manager.getRepository(Invoice).delete(id);
    });
  }
}

export function refuseUnlessDraft(invoice: Invoice, what: 'changed' | 'deleted'): void {
  if (invoice.status === 'draft') return;
  const instead = what === 'deleted' ? 'void it instead (with a reason).' : 'issue a credit note or void it instead.';
  throw new DomainError('conflict', `Invoice ${invoice.number ?? ''} is issued and cannot be ${what}; ${instead}`);
}

/**
 * The discount after a change: a kind named replaces the other (switching from a share to an amount), a field left
 * out keeps what the draft had. Both kinds at once are refused.
 */
function discountTerms(
  dto: InvoiceTermsDto,
  current: { discountBp: number; discountCents: number },
): { discountBp: number; discountCents: number } {
  if ((dto.discountBp ?? 0) > 0 && (dto.discountCents ?? 0) > 0) {
    const message = 'Give the discount either as a share or as an amount, not both.';
    throw new DomainError('invalid_input', message, { discountCents: [message] });
  }
  if (dto.discountBp !== undefined && dto.discountBp > 0) return { discountBp: dto.discountBp, discountCents: 0 };
  if (dto.discountCents !== undefined && dto.discountCents > 0) {
    return { discountBp: 0, discountCents: dto.discountCents };
  }
  return {
    discountBp: dto.discountBp === undefined ? current.discountBp : 0,
    discountCents: dto.discountCents === undefined ? current.discountCents : 0,
  };
}

/** Locked in id order, so two drafts racing for the same tickets queue instead of deadlocking. */
async function lockTickets(manager: EntityManager, ids: string[]): Promise<Ticket[]> {
  const tickets = await manager
    .getRepository(Ticket)
    .createQueryBuilder('ticket')
    .setLock('pessimistic_write')
    .where('ticket.id IN (:...ids)', { ids })
    .orderBy('ticket.id')
    .getMany();
  if (tickets.length !== new Set(ids).size) throw notFound('One of the tickets');
  return tickets.sort(
    (a, b) =>
      a.visitDay.localeCompare(b.visitDay) || a.createdAt.getTime() - b.createdAt.getTime() || a.id.localeCompare(b.id),
  );
}

function refuseUninvoiceable(ticket: Ticket, label: string): void {
  if (ticket.status === 'open') {
    throw new DomainError('conflict', `${label} is still open; finish it before invoicing.`);
  }
  if (ticket.settlement !== 'to-invoice') {
    const why = ticket.settlement === 'paid-on-site' ? 'was paid on site' : 'is not left for an invoice';
    throw new DomainError('conflict', `${label} ${why}; only tickets left for an invoice are invoiced.`);
  }
  if (ticket.invoiceId !== null) {
    throw new DomainError('conflict', `${label} is already on an invoice; void or delete that one first.`);
  }
}

function samePayer(tickets: Ticket[], stopById: Map<string, Stop>, label: (ticket: Ticket) => string): Payer {
  const payers = tickets.map((ticket) =>
    payerOf(ticket, ticket.stopId ? (stopById.get(ticket.stopId)?.billingMode ?? null) : null),
  );
  const first = payers[0]!;
  const other = payers.findIndex((payer) => payerKey(payer) !== payerKey(first));
  if (other >= 0) {
    throw new DomainError(
      'conflict',
      `${label(tickets[0]!)} and ${label(tickets[other]!)} are billed to different payers; make one invoice per payer.`,
    );
  }
  return first;
}

/** "Ticket 2026-12-03, Wren Talbot at Pine Street Salon": how an invoice names each ticket it bills. */
export function ticketLabel(
  ticket: Pick<Ticket, 'visitDay' | 'stopId'>,
  customer: Pick<Customer, 'name'>,
  stopById: ReadonlyMap<string, Pick<Stop, 'name'>>,
): string {
  const stop = ticket.stopId ? stopById.get(ticket.stopId) : undefined;
  return `Ticket ${ticket.visitDay}, ${customer.name}${stop ? ` at ${stop.name}` : ''}`;
}

/** Each ticket's shear lines at their effective price plus its adjustment, by the rules package. */
async function invoiceLines(
  manager: EntityManager,
  tickets: Ticket[],
  label: (ticket: Ticket) => string,
): Promise<(InvoiceLineDraft & { ticketId: string })[]> {
  const ticketLines = await manager
    .getRepository(TicketLine)
    .find({ where: { ticketId: In(tickets.map((ticket) => ticket.id)) }, order: { position: 'ASC' } });
  const shears = await manager.getRepository(Shear).findBy({ id: In(ticketLines.map((line) => line.shearId)) });
  const shearById = new Map(shears.map((shear) => [shear.id, shear]));
  return tickets.flatMap((ticket) => {
    const forInvoice: TicketForInvoice = {
      label: label(ticket),
      lines: ticketLines
        .filter((line) => line.ticketId === ticket.id)
        .map((line) => ({
          ticketLineId: line.id,
          description: shearDescription(line, shearById.get(line.shearId)!),
          amountCents: line.overrideCents ?? line.priceCents,
        })),
      subtotalCents: ticket.subtotalCents,
      taxRateBp: ticket.taxRateBp,
      servicesTaxable: ticket.servicesTaxable,
      adjustmentLabel: adjustmentLabel(ticket.priceSummary),
    };
    return invoiceLinesFromTicket(forInvoice).map((line) => ({ ...line, ticketId: ticket.id }));
  });
}

/** The invoice line of one shear (the demo's visit history writes its invoices with it too). */
export function shearDescription(
  line: Pick<TicketLine, 'addOns' | 'overrideCents'>,
  shear: Pick<Shear, 'tagCode' | 'edgeType' | 'toolKind' | 'lengthIn' | 'handedness' | 'use'>,
): string {
  const addOns = line.addOns.map((code) => ADD_ON_LABELS[code]);
  const work = [describeShear(shear), ...addOns].join(' + ');
  return `${shear.tagCode} ${work}${line.overrideCents !== null ? ' (price set by hand)' : ''}`;
}

/** The ticket's discount, minimum and trip charge in words: its price summary without the tax and override notes. */
export function adjustmentLabel(summary: readonly string[]): string {
  const parts = summary.slice(0, -1).filter((part) => !part.startsWith('price set on '));
  return parts.length > 0 ? parts.join('; ') : 'ticket price adjustment';
}

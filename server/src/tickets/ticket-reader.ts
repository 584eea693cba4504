import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { TAX_RULES_NOTE } from '@keenroute/shared';
import { In, type DataSource } from 'typeorm';
import { TicketAccess } from '../access/ticket-access';
import type { Actor } from '../auth/actor';
import { notFound } from '../common/errors/domain-error';
import { refOrNull } from '../customers/dto/ref.dto';
import { Customer } from '../customers/entities/customer.entity';
import { ShearPhoto } from '../shears/entities/shear-photo.entity';
import { Shear } from '../shears/entities/shear.entity';
import { Stop } from '../stops/entities/stop.entity';
import type { ListTicketsQueryDto } from './dto/list-tickets-query.dto';
import type { TicketDto, TicketLineDto, TicketSummaryDto } from './dto/ticket-response.dto';
import { TicketLine } from './entities/ticket-line.entity';
import { Ticket } from './entities/ticket.entity';
import { toPaymentDto } from './payments/dto/payment.dto';
import { Payment } from '../payments/entities/payment.entity';
import { paidCents } from './payments/settlement';
import { recipeSummary } from './ticket-recipe';

interface SummaryRaw {
  ticket_id: string;
  customer_name: string;
  stop_name: string | null;
  line_count: number;
}

/** Reads tickets as the API shows them; callers have already checked the actor may read the ticket. */
@Injectable()
export class TicketReader {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly access: TicketAccess,
  ) {}

  async list(actor: Actor, query: ListTicketsQueryDto): Promise<{ items: TicketSummaryDto[]; total: number }> {
    const builder = this.access
      .scopeTickets(this.dataSource.getRepository(Ticket).createQueryBuilder('ticket'), actor, 'ticket')
      .innerJoin(Customer, 'customer', 'customer.id = ticket.customerId')
      .leftJoin(Stop, 'stop', 'stop.id = ticket.stopId')
      .addSelect('customer.name', 'customer_name')
      .addSelect('stop.name', 'stop_name')
      .addSelect('(SELECT COUNT(*)::int FROM ticket_lines counted WHERE counted.ticket_id = ticket.id)', 'line_count');
    if (query.day) builder.andWhere('ticket.visitDay = :day', { day: query.day });
    if (query.stopId) builder.andWhere('ticket.stopId = :stopId', { stopId: query.stopId });
    if (query.customerId) builder.andWhere('ticket.customerId = :customerId', { customerId: query.customerId });
    if (query.routeDayId) builder.andWhere('ticket.routeDayId = :routeDayId', { routeDayId: query.routeDayId });
    if (query.status) builder.andWhere('ticket.status = :status', { status: query.status });
    if (query.settlement) builder.andWhere('ticket.settlement = :settlement', { settlement: query.settlement });
    const total = await builder.getCount();
    const { entities, raw } = await builder
      .orderBy('ticket.visitDay', 'DESC')
      .addOrderBy('ticket.createdAt', 'ASC')
      .addOrderBy('ticket.id', 'ASC')
      .offset((query.page - 1) * query.pageSize)
      .limit(query.pageSize)
      .getRawAndEntities<SummaryRaw>();
    const byId = new Map(raw.map((row) => [row.ticket_id, row]));
    const items = entities.map((ticket): TicketSummaryDto => {
      const row = byId.get(ticket.id);
      return {
        id: ticket.id,
        kind: ticket.kind,
        status: ticket.status,
        customer: { id: ticket.customerId, name: row?.customer_name ?? '' },
        stop: refOrNull(ticket.stopId, row?.stop_name ?? null),
        routeDayId: ticket.routeDayId,
        visitDay: ticket.visitDay,
        lineCount: row?.line_count ?? 0,
        totalCents: ticket.totalCents,
        settlement: ticket.settlement,
        createdAt: ticket.createdAt.toISOString(),
      };
    });
    return { items, total };
  }

  /** A client sees their ticket without the sharpener's working notes on each pair, as on their shears. */
  async get(actor: Actor, id: string): Promise<TicketDto> {
    await this.access.requireTicket(actor, id, 'read');
    const ticket = await this.detail(id);
    return actor.role === 'client'
      ? { ...ticket, lines: ticket.lines.map((line) => ({ ...line, notes: '' })) }
      : ticket;
  }

  async detail(id: string): Promise<TicketDto> {
    const manager = this.dataSource.manager;
    const ticket = await manager.getRepository(Ticket).findOneBy({ id });
    if (!ticket) throw notFound('The ticket');
    const [customer, stop, lines, payments] = await Promise.all([
      manager.getRepository(Customer).findOneByOrFail({ id: ticket.customerId }),
      ticket.stopId ? manager.getRepository(Stop).findOneBy({ id: ticket.stopId }) : null,
      manager.getRepository(TicketLine).find({ where: { ticketId: id }, order: { position: 'ASC' } }),
      manager.getRepository(Payment).find({ where: { ticketId: id }, order: { recordedAt: 'ASC', id: 'ASC' } }),
    ]);
    const lineIds = lines.map((line) => line.id);
    const [shears, photos] = await Promise.all([
      manager.getRepository(Shear).findBy({ id: In(lines.map((line) => line.shearId)) }),
      lineIds.length
        ? manager
            .getRepository(ShearPhoto)
            .find({ where: { ticketLineId: In(lineIds) }, order: { createdAt: 'ASC', id: 'ASC' } })
        : [],
    ]);
    const shearById = new Map(shears.map((shear) => [shear.id, shear]));
    return {
      id: ticket.id,
      kind: ticket.kind,
      status: ticket.status,
      customer: { id: customer.id, name: customer.name, phone: customer.phone, email: customer.email },
      stop: stop ? { id: stop.id, name: stop.name } : null,
      routeDayId: ticket.routeDayId,
      bookingId: ticket.bookingId,
      visitDay: ticket.visitDay,
      lines: lines.map((line) => toLineDto(line, shearById.get(line.shearId)!, photos)),
      expected: ticket.expected,
      price: {
        currency: ticket.currency,
        subtotalCents: ticket.subtotalCents,
        taxCents: ticket.taxCents,
        totalCents: ticket.totalCents,
        summary: ticket.priceSummary,
        taxNote: TAX_RULES_NOTE,
        chargeTrip: ticket.chargeTrip,
        rateCardVersion: ticket.rateCardVersion,
      },
      payments: payments.map(toPaymentDto),
      balanceCents: ticket.totalCents - paidCents(payments),
      settlement: ticket.settlement,
      notes: ticket.notes,
      createdAt: ticket.createdAt.toISOString(),
      finishedAt: ticket.finishedAt?.toISOString() ?? null,
      handedBackAt: ticket.handedBackAt?.toISOString() ?? null,
    };
  }
}

function toLineDto(line: TicketLine, shear: Shear, photos: ShearPhoto[]): TicketLineDto {
  return {
    id: line.id,
    shear: {
      id: shear.id,
      tagCode: shear.tagCode,
      make: shear.make,
      model: shear.model,
      lengthIn: shear.lengthIn,
      edgeType: shear.edgeType,
      toolKind: shear.toolKind,
      handedness: shear.handedness,
    },
    addOns: line.addOns,
    priceCents: line.priceCents,
    explanation: line.explanation,
    overrideCents: line.overrideCents,
    overrideReason: line.overrideReason,
    effectiveCents: line.overrideCents ?? line.priceCents,
    benchStatus: line.benchStatus,
    notes: line.notes,
    recipe: recipeSummary(shear, line.addOns),
    photos: photos
      .filter((photo) => photo.ticketLineId === line.id)
      .map((photo) => ({ id: photo.id, stage: photo.stage, url: `/api/shears/${shear.id}/photos/${photo.id}` })),
  };
}

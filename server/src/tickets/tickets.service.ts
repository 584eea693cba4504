import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { normalizeTagCode } from '@keenroute/shared';
import type { DataSource, EntityManager } from 'typeorm';
import { RegistryAccess } from '../access/registry-access';
import { AuditService } from '../audit/audit.service';
import { TicketAccess } from '../access/ticket-access';
import type { Actor } from '../auth/actor';
import { DomainError, notFound } from '../common/errors/domain-error';
import { Shear } from '../shears/entities/shear.entity';
import { ShearsService } from '../shears/shears.service';
import type { CreateTicketDto } from './dto/create-ticket.dto';
import type { AddLineDto, OverrideLineDto, UpdateLineDto } from './dto/line.dto';
import type { TicketDto } from './dto/ticket-response.dto';
import { TicketLineOverride } from './entities/ticket-line-override.entity';
import { TicketLine } from './entities/ticket-line.entity';
import { Ticket, type ExpectedPairs } from './entities/ticket.entity';
import { checkBenchMove } from './bench-status';
import { handBackIfAllReturned } from './ticket-closing';
import { TicketReader } from './ticket-reader';
import { TicketWriter } from './ticket-writer';

/** Opening tickets and changing their lines: shears, add-ons, bench status, notes and prices set by hand. */
@Injectable()
export class TicketsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly access: TicketAccess,
    private readonly registry: RegistryAccess,
    private readonly writer: TicketWriter,
    private readonly reader: TicketReader,
    private readonly shears: ShearsService,
    private readonly audit: AuditService,
  ) {}

  async create(actor: Actor, dto: CreateTicketDto): Promise<TicketDto> {
    const customer = await this.registry.requireCustomer(actor, dto.customerId, 'read');
    const stopId = dto.stopId ?? (dto.kind === 'drop-off' ? null : customer.stopId);
    const routeDay = await this.routeDayFor(actor, stopId, dto.routeDayId);
    const id = await this.dataSource.transaction(async (manager) => {
      const ticket = await this.writer.open(manager, actor, {
        customerId: customer.id,
        stopId,
        routeDayId: routeDay?.id ?? null,
        visitDay: routeDay?.day ?? this.writer.today(),
        kind: dto.kind,
        notes: dto.notes,
        tripChargeable: true,
      });
      return ticket.id;
    });
    return this.reader.detail(id);
  }

  async addLine(actor: Actor, ticketId: string, dto: AddLineDto): Promise<TicketDto> {
    const found = await this.access.requireTicket(actor, ticketId, 'work');
    if (found.status !== 'open')
      throw new DomainError('conflict', 'This ticket is finished; its shears stay as they are.');
    const shear = await this.shearFor(actor, found.customerId, dto);
    await this.dataSource.transaction(async (manager) => {
      const ticket = await this.openTicket(manager, ticketId);
      if (shear.customerId !== ticket.customerId) {
        const message = `${shear.tagCode} is registered to another customer; move it to this customer first.`;
        throw new DomainError('conflict', message, { shearId: [message] });
      }
      const elsewhere = await manager
        .getRepository(TicketLine)
        .createQueryBuilder('line')
        .innerJoin(Ticket, 'other', 'other.id = line.ticketId')
        .where('line.shearId = :shearId AND other.status = :open', { shearId: shear.id, open: 'open' })
        .getOne();
      if (elsewhere) {
        const message =
          elsewhere.ticketId === ticket.id
            ? `${shear.tagCode} is already on this ticket.`
            : `${shear.tagCode} is on another open ticket; finish or remove it there first.`;
        throw new DomainError('conflict', message, { shearId: [message] });
      }
      const lines = await this.writer.lines(manager, ticket.id);
      await manager.getRepository(TicketLine).insert({
        ticketId: ticket.id,
        shearId: shear.id,
        addOns: dto.addOns ?? [],
        position: lines.reduce((max, line) => Math.max(max, line.position + 1), 0),
      });
      ticket.expected = takeExpected(ticket.expected, shear);
      await this.writer.reprice(manager, ticket);
    });
    return this.reader.detail(ticketId);
  }

  /**
   * While the ticket is open everything on a line may change; once it is finished only a pair's hand-back is
   * recorded, and the ticket is handed back when its last pair is.
   */
  async updateLine(actor: Actor, ticketId: string, lineId: string, dto: UpdateLineDto): Promise<TicketDto> {
    await this.access.requireTicket(actor, ticketId, 'work');
    await this.dataSource.transaction(async (manager) => {
      const ticket = await this.writer.lock(manager, ticketId);
      const line = await this.lineOf(manager, ticket, lineId);
      const handingBack = dto.benchStatus === 'handed-back' && dto.addOns === undefined && dto.notes === undefined;
      if (ticket.status === 'handed-back' || (ticket.status === 'finished' && !handingBack)) {
        throw new DomainError('conflict', 'This ticket is finished; its lines no longer change.');
      }
      if (dto.benchStatus) checkBenchMove(line.benchStatus, dto.benchStatus);
      const changes: Partial<TicketLine> = {};
      if (dto.benchStatus) changes.benchStatus = dto.benchStatus;
      if (dto.notes !== undefined) changes.notes = dto.notes;
      if (dto.addOns) changes.addOns = dto.addOns;
      if (Object.keys(changes).length > 0) await manager.getRepository(TicketLine).update(line.id, changes);
      if (dto.addOns) await this.writer.reprice(manager, ticket);
      if (ticket.status === 'finished') await handBackIfAllReturned(manager, ticket);
    });
    return this.reader.detail(ticketId);
  }

  async removeLine(actor: Actor, ticketId: string, lineId: string): Promise<TicketDto> {
    await this.access.requireTicket(actor, ticketId, 'work');
    await this.dataSource.transaction(async (manager) => {
      const ticket = await this.openTicket(manager, ticketId);
      const line = await this.lineOf(manager, ticket, lineId);
      await manager.getRepository(TicketLine).delete({ id: line.id });
      await this.writer.reprice(manager, ticket);
    });
    return this.reader.detail(ticketId);
  }

  /** Owner or office only, with a reason; every override leaves an audit row. Prices stay open until money is taken. */
  async override(actor: Actor, ticketId: string, lineId: string, dto: OverrideLineDto): Promise<TicketDto> {
    await this.access.requireTicket(actor, ticketId, 'override');
    await this.dataSource.transaction(async (manager) => {
      const ticket = await this.writer.lock(manager, ticketId);
      const paid = await manager.query<{ n: number }[]>(
        'SELECT COUNT(*)::int AS n FROM payments WHERE ticket_id = $1',
        [ticket.id],
      );
      if (ticket.settlement !== 'unpaid' || (paid[0]?.n ?? 0) > 0) {
        throw new DomainError('conflict', 'Money has been taken or an invoice is due on this ticket: its prices stay.');
      }
      const line = await this.lineOf(manager, ticket, lineId);
      const fromCents = line.overrideCents ?? line.priceCents;
      await manager.getRepository(TicketLineOverride).insert({
        ticketId: ticket.id,
        ticketLineId: line.id,
        shearId: line.shearId,
        fromCents,
        toCents: dto.cents,
        reason: dto.reason,
        byUser: actor.id,
      });
      await this.audit.record(
        {
          action: 'price-override',
          actor,
          subject: { type: 'ticket', id: ticket.id },
          detail: { lineId: line.id, shearId: line.shearId, fromCents, toCents: dto.cents, reason: dto.reason },
        },
        manager,
      );
      await manager.getRepository(TicketLine).update(line.id, { overrideCents: dto.cents, overrideReason: dto.reason });
      await this.writer.reprice(manager, ticket);
    });
    return this.reader.detail(ticketId);
  }

  /**
   * The route day a ticket belongs to. A sharpener works only their own days, at stops on them: without a day named,
   * their day at this stop today. For the office, today's day at the stop is taken when there is one.
   */
  private async routeDayFor(
    actor: Actor,
    stopId: string | null,
    routeDayId: string | undefined,
  ): Promise<{ id: string; day: string } | null> {
    const admin = this.access.isAdmin(actor);
    if (routeDayId) {
      await this.access.requireOwnRouteDay(actor, routeDayId);
      const [day] = await this.dataSource.query<{ id: string; day: string; has_stop: boolean }[]>(
        `SELECT rd.id, to_char(rd.day, 'YYYY-MM-DD') AS day,
                EXISTS (SELECT 1 FROM route_day_stops rds WHERE rds.route_day_id = rd.id AND rds.stop_id = $2) AS has_stop
           FROM route_days rd WHERE rd.id = $1`,
        [routeDayId, stopId],
      );
      if (!day) throw notFound('The route day');
      if (!day.has_stop) {
        const message = 'That stop is not on this route day.';
        throw new DomainError('invalid_input', message, { routeDayId: [message] });
      }
      return { id: day.id, day: day.day };
    }
    const [today] = stopId
      ? await this.dataSource.query<{ id: string; day: string }[]>(
          `SELECT rd.id, to_char(rd.day, 'YYYY-MM-DD') AS day FROM route_days rd
             JOIN route_day_stops rds ON rds.route_day_id = rd.id AND rds.stop_id = $1
            WHERE rd.day = $2 AND ($3::uuid IS NULL OR rd.sharpener_id = $3)
            ORDER BY rd.created_at LIMIT 1`,
          [stopId, this.writer.today(), admin ? null : actor.id],
        )
      : [];
    if (today) return today;
    if (admin) return null;
    throw new DomainError('forbidden', 'You open tickets at the stops on your route days; this stop is not on yours.');
  }

  /** The shear by id or tag code; a new one is registered to the ticket's customer (a sharpener meets them at the stop). */
  private async shearFor(actor: Actor, customerId: string, dto: AddLineDto): Promise<Shear> {
    if (dto.newShear) {
      const created = await this.shears.create(actor, { ...dto.newShear, customerId });
      return this.registry.requireShear(actor, created.id, 'read');
    }
    if (dto.shearId) return this.registry.requireShear(actor, dto.shearId, 'read');
    const code = dto.tagCode ? normalizeTagCode(dto.tagCode) : undefined;
    const found = code
      ? await this.dataSource.getRepository(Shear).findOne({ where: { tagCode: code }, select: { id: true } })
      : null;
    if (!found) {
      const message = 'No shear has that tag code. Check the label, or add the shear as a new one.';
      throw new DomainError('not_found', message, { tagCode: [message] });
    }
    return this.registry.requireShear(actor, found.id, 'read');
  }

  private async openTicket(manager: EntityManager, id: string): Promise<Ticket> {
    const ticket = await this.writer.lock(manager, id);
    if (ticket.status !== 'open')
      throw new DomainError('conflict', 'This ticket is finished; its shears stay as they are.');
    return ticket;
  }

  private async lineOf(manager: EntityManager, ticket: Ticket, lineId: string): Promise<TicketLine> {
    const line = await manager.getRepository(TicketLine).findOneBy({ id: lineId, ticketId: ticket.id });
    if (!line) throw notFound('The ticket line');
    return line;
  }
}

/** A booked "to add" pair is taken off the list when a shear of that kind and edge type joins the ticket. */
export function takeExpected(expected: readonly ExpectedPairs[], shear: Pick<Shear, 'toolKind' | 'edgeType'>) {
  const index = expected.findIndex((pair) => pair.toolKind === shear.toolKind && pair.edgeType === shear.edgeType);
  if (index < 0) return [...expected];
  return expected
    .map((pair, at) => (at === index ? { ...pair, count: pair.count - 1 } : pair))
    .filter((pair) => pair.count > 0);
}

import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { ADD_ON_LABELS, EDGE_TYPE_LABELS, formatLength, type AddOnCode } from '@keenroute/shared';
import { In, type DataSource, type EntityManager } from 'typeorm';
import { TicketAccess } from '../access/ticket-access';
import type { Actor } from '../auth/actor';
import { DomainError } from '../common/errors/domain-error';
import { ShearHistoryEntry } from '../shears/entities/shear-history-entry.entity';
import { Shear } from '../shears/entities/shear.entity';
import { isDone } from './bench-status';
import type { TicketDto } from './dto/ticket-response.dto';
import { TicketLine } from './entities/ticket-line.entity';
import { Ticket } from './entities/ticket.entity';
import { TicketReader } from './ticket-reader';
import { TicketWriter } from './ticket-writer';

/** "Sharpened: convex straight, 6.5 in; inside-edge hone": the history line a finished ticket leaves on a shear. */
export function servicedSummary(
  shear: Pick<Shear, 'edgeType' | 'toolKind' | 'lengthIn'>,
  addOns: readonly AddOnCode[],
): string {
  const done = `Sharpened: ${EDGE_TYPE_LABELS[shear.edgeType]} ${shear.toolKind}, ${formatLength(shear.lengthIn)}`;
  return addOns.length ? `${done}; ${addOns.map((code) => ADD_ON_LABELS[code]).join(', ')}` : done;
}

/** Once every pair of a finished ticket is handed back, so is the ticket. */
export async function handBackIfAllReturned(manager: EntityManager, ticket: Ticket): Promise<void> {
  const lines = await manager.getRepository(TicketLine).findBy({ ticketId: ticket.id });
  if (lines.length === 0 || lines.some((line) => line.benchStatus !== 'handed-back')) return;
  ticket.status = 'handed-back';
  ticket.handedBackAt = new Date();
  await manager.getRepository(Ticket).save(ticket);
}

/** Finishing (every pair done: history rows written) and handing back (the pairs are with their owner again). */
@Injectable()
export class TicketClosing {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly access: TicketAccess,
    private readonly writer: TicketWriter,
    private readonly reader: TicketReader,
  ) {}

  async finish(actor: Actor, id: string): Promise<TicketDto> {
    await this.access.requireTicket(actor, id, 'work');
    await this.dataSource.transaction(async (manager) => {
      const ticket = await this.writer.lock(manager, id);
      if (ticket.status !== 'open') throw new DomainError('conflict', 'This ticket is already finished.');
      await this.finishLocked(manager, actor, ticket);
    });
    return this.reader.detail(id);
  }

  /** Hands back every pair; an open ticket whose pairs are all done is finished on the way. */
  async handBack(actor: Actor, id: string): Promise<TicketDto> {
    await this.access.requireTicket(actor, id, 'work');
    await this.dataSource.transaction(async (manager) => {
      const ticket = await this.writer.lock(manager, id);
      if (ticket.status === 'handed-back') throw new DomainError('conflict', 'This ticket is already handed back.');
      if (ticket.status === 'open') await this.finishLocked(manager, actor, ticket);
      await manager
        .getRepository(TicketLine)
        .update({ ticketId: ticket.id, benchStatus: 'ready' }, { benchStatus: 'handed-back' });
      await handBackIfAllReturned(manager, ticket);
    });
    return this.reader.detail(id);
  }

  private async finishLocked(manager: EntityManager, actor: Actor, ticket: Ticket): Promise<void> {
    const lines = await this.writer.lines(manager, ticket.id);
    if (lines.length === 0) throw new DomainError('conflict', 'Add the shears worked before finishing the ticket.');
    const waiting = lines.filter((line) => !isDone(line.benchStatus)).length;
    if (waiting > 0) {
      const pairs = waiting === 1 ? '1 pair is' : `${waiting} pairs are`;
      throw new DomainError('conflict', `${pairs} not ready yet; mark each pair ready before finishing.`);
    }
    await this.writer.reprice(manager, ticket);
    const shears = await manager.getRepository(Shear).findBy({ id: In(lines.map((line) => line.shearId)) });
    const byId = new Map(shears.map((shear) => [shear.id, shear]));
    await manager.getRepository(ShearHistoryEntry).insert(
      lines.map((line) => ({
        shearId: line.shearId,
        kind: 'serviced' as const,
        summary: servicedSummary(byId.get(line.shearId)!, line.addOns),
        happenedOn: ticket.visitDay,
        ticketId: ticket.id,
        recordedBy: actor.id,
      })),
    );
    if (ticket.stopId && ticket.kind !== 'drop-off') await recordStopVisit(manager, ticket, actor);
    ticket.status = 'finished';
    ticket.finishedAt = new Date();
    await manager.getRepository(Ticket).save(ticket);
    await handBackIfAllReturned(manager, ticket);
  }
}

/**
 * A finished ticket at a stop means the stop was worked that day: its visit is recorded once (the next due date counts
 * from it), by the route day's sharpener when there is one. The advisory lock keeps two tickets finishing together
 * from both inserting.
 */
async function recordStopVisit(manager: EntityManager, ticket: Ticket, actor: Actor): Promise<void> {
  await manager.query('SELECT pg_advisory_xact_lock(hashtext($1))', [`stop-visit:${ticket.stopId}:${ticket.visitDay}`]);
  await manager.query(
    `INSERT INTO stop_visits (stop_id, worked_on, sharpener_id)
     SELECT $1, $2::date, COALESCE((SELECT sharpener_id FROM route_days WHERE id = $3), $4)
      WHERE NOT EXISTS (SELECT 1 FROM stop_visits WHERE stop_id = $1 AND worked_on = $2::date)`,
    [ticket.stopId, ticket.visitDay, ticket.routeDayId, actor.role === 'office' ? null : actor.id],
  );
}

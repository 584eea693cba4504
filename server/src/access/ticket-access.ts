import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, ObjectLiteral, SelectQueryBuilder } from 'typeorm';
import type { Actor } from '../auth/actor';
import { DomainError, notFound } from '../common/errors/domain-error';
import { Ticket } from '../tickets/entities/ticket.entity';

/**
 * Who may do what with tickets: owner and office everything; a sharpener reads and works the tickets on their own
 * route days (prices set by hand are the owner's or office's); a client reads their own. A ticket the caller may not
 * read answers 404, as if it did not exist.
 */
export type TicketAction = 'read' | 'work' | 'override';

const ADMIN = new Set(['owner', 'office']);
const MY_ROUTE_DAYS = 'SELECT mine.id FROM route_days mine WHERE mine.sharpener_id = :scopeActor';
const MY_CUSTOMERS = 'SELECT own.id FROM customers own WHERE own.user_id = :scopeActor';

@Injectable()
export class TicketAccess {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  isAdmin(actor: Actor): boolean {
    return ADMIN.has(actor.role);
  }

  /** Narrows a tickets query to what the actor may read. */
  scopeTickets<T extends ObjectLiteral>(query: SelectQueryBuilder<T>, actor: Actor, alias: string) {
    if (ADMIN.has(actor.role)) return query;
    if (actor.role === 'sharpener') {
      return query.andWhere(`${alias}.routeDayId IN (${MY_ROUTE_DAYS})`, { scopeActor: actor.id });
    }
    if (actor.role === 'client') {
      return query.andWhere(`${alias}.customerId IN (${MY_CUSTOMERS})`, { scopeActor: actor.id });
    }
    return query.andWhere('false');
  }

  async requireTicket(actor: Actor, id: string, action: TicketAction): Promise<Ticket> {
    const ticket = await this.scopeTickets(
      this.dataSource.getRepository(Ticket).createQueryBuilder('ticket').where('ticket.id = :id', { id }),
      actor,
      'ticket',
    ).getOne();
    if (!ticket) throw notFound('The ticket');
    if (ADMIN.has(actor.role) || action === 'read') return ticket;
    if (action === 'work' && actor.role === 'sharpener') return ticket;
    throw new DomainError(
      'forbidden',
      action === 'override'
        ? 'Only the owner or the office sets a price by hand.'
        : 'Your role may only read this ticket.',
    );
  }

  /** A sharpener may open or check in tickets only on a route day of their own; others answer 404 for it. */
  async requireOwnRouteDay(actor: Actor, routeDayId: string): Promise<void> {
    if (ADMIN.has(actor.role)) return;
    const rows = await this.dataSource.query<unknown[]>(
      'SELECT 1 FROM route_days WHERE id = $1 AND sharpener_id = $2',
      [routeDayId, actor.id],
    );
    if (rows.length === 0) throw notFound('The route day');
  }
}

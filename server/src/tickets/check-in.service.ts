import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { isEdgeType, isToolKind } from '@keenroute/shared';
import type { DataSource, EntityManager } from 'typeorm';
import { TicketAccess } from '../access/ticket-access';
import type { Actor } from '../auth/actor';
import { DomainError, notFound } from '../common/errors/domain-error';
import { Customer } from '../customers/entities/customer.entity';
import type { TicketDto } from './dto/ticket-response.dto';
import { TicketLine } from './entities/ticket-line.entity';
import type { ExpectedPairs } from './entities/ticket.entity';
import { TicketReader } from './ticket-reader';
import { TicketWriter } from './ticket-writer';

/** The booking as check-in reads it: plain SQL, so tickets do not depend on the bookings module's classes. */
interface BookingRow {
  id: string;
  stop_id: string;
  route_day_id: string | null;
  day: string | null;
  route_day: string | null;
  mail_in: boolean;
  status: 'booked' | 'cancelled' | 'checked-in';
  name: string;
  email: string;
  phone: string;
  notes: string;
  customer_id: string | null;
  ticket_id: string | null;
}

export interface BookingItemRow {
  tool_kind: string;
  edge_type: string;
  count: number;
  shear_id: string | null;
}

/** Checking in a drop-off: the booking becomes a ticket, once, in one transaction. */
@Injectable()
export class CheckInService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly access: TicketAccess,
    private readonly writer: TicketWriter,
    private readonly reader: TicketReader,
  ) {}

  async checkIn(actor: Actor, bookingId: string): Promise<TicketDto> {
    const ticketId = await this.dataSource.transaction(async (manager) => {
      const booking = await this.lockBooking(manager, actor, bookingId);
      // A second check-in (a double tap, a second phone) answers the ticket the first one made.
      if (booking.status === 'checked-in' && booking.ticket_id) return booking.ticket_id;
      if (booking.status === 'cancelled') throw new DomainError('conflict', 'This booking was cancelled.');
      const items = await manager.query<BookingItemRow[]>(
        'SELECT tool_kind, edge_type, count, shear_id FROM booking_items WHERE booking_id = $1 ORDER BY position, id',
        [booking.id],
      );
      const customer = await this.customerFor(manager, booking);
      const shearIds = await this.ownShears(manager, customer.id, items);
      const ticket = await this.writer.open(manager, actor, {
        customerId: customer.id,
        stopId: booking.stop_id,
        routeDayId: booking.route_day_id,
        visitDay: booking.day ?? booking.route_day ?? this.writer.today(),
        kind: 'drop-off',
        bookingId: booking.id,
        expected: expectedPairs(items.filter((item) => !item.shear_id || !shearIds.includes(item.shear_id))),
        notes: booking.notes,
        tripChargeable: !booking.mail_in,
      });
      if (shearIds.length > 0) {
        await manager
          .getRepository(TicketLine)
          .insert(shearIds.map((shearId, position) => ({ ticketId: ticket.id, shearId, position, addOns: [] })));
        await this.writer.reprice(manager, ticket);
      }
      await manager.query(
        `UPDATE bookings SET status = 'checked-in', ticket_id = $2, customer_id = $3, updated_at = now() WHERE id = $1`,
        [booking.id, ticket.id, customer.id],
      );
      return ticket.id;
    });
    return this.reader.detail(ticketId);
  }

  /** Owner and office check in any booking; a sharpener only those on their own route days (others answer 404). */
  private async lockBooking(manager: EntityManager, actor: Actor, id: string): Promise<BookingRow> {
    const [booking] = await manager.query<BookingRow[]>(
      `SELECT b.id, b.stop_id, b.route_day_id, to_char(b.day, 'YYYY-MM-DD') AS day,
              to_char(rd.day, 'YYYY-MM-DD') AS route_day, b.mail_in, b.status, b.name, b.email, b.phone, b.notes,
              b.customer_id, b.ticket_id, rd.sharpener_id
         FROM bookings b LEFT JOIN route_days rd ON rd.id = b.route_day_id
        WHERE b.id = $1 FOR UPDATE OF b`,
      [id],
    );
    if (!booking) throw notFound('The booking');
    if (!this.access.isAdmin(actor)) {
      const own = (booking as BookingRow & { sharpener_id: string | null }).sharpener_id === actor.id;
      if (!own) throw notFound('The booking');
    }
    return booking;
  }

  /** The booking's customer; else the one with its e-mail; else the only one of its name at the stop; else a new one. */
  private async customerFor(manager: EntityManager, booking: BookingRow): Promise<Customer> {
    const customers = manager.getRepository(Customer);
    if (booking.customer_id) {
      const linked = await customers.findOneBy({ id: booking.customer_id });
      if (linked) return linked;
    }
    const byEmail = await customers
      .createQueryBuilder('customer')
      .where('lower(customer.email) = lower(:email)', { email: booking.email })
      .getOne();
    if (byEmail) return byEmail;
    const byName = await customers
      .createQueryBuilder('customer')
      .where('customer.stopId = :stopId AND lower(customer.name) = lower(:name)', {
        stopId: booking.stop_id,
        name: booking.name.trim(),
      })
      .limit(2)
      .getMany();
    if (byName.length === 1) return byName[0]!;
    return customers.save(
      customers.create({
        name: booking.name.trim(),
        email: booking.email.trim().toLowerCase(),
        phone: booking.phone || null,
        stopId: booking.mail_in ? null : booking.stop_id,
        notes: '',
      }),
    );
  }

  /** The booked shears that are the customer's own; any other is treated like a pair booked by kind. */
  private async ownShears(manager: EntityManager, customerId: string, items: BookingItemRow[]): Promise<string[]> {
    const wanted = [...new Set(items.flatMap((item) => (item.shear_id ? [item.shear_id] : [])))];
    if (wanted.length === 0) return [];
    const rows = await manager.query<{ id: string }[]>(
      'SELECT id FROM shears WHERE id = ANY($1::uuid[]) AND customer_id = $2',
      [wanted, customerId],
    );
    const own = new Set(rows.map((row) => row.id));
    return wanted.filter((id) => own.has(id));
  }
}

/** Booked pairs by kind and edge type, added up, for the ticket's "to add" list. */
export function expectedPairs(items: readonly BookingItemRow[]): ExpectedPairs[] {
  const pairs: ExpectedPairs[] = [];
  for (const item of items) {
    if (!isToolKind(item.tool_kind) || !isEdgeType(item.edge_type)) continue;
    const same = pairs.find((pair) => pair.toolKind === item.tool_kind && pair.edgeType === item.edge_type);
    if (same) same.count += item.count;
    else pairs.push({ toolKind: item.tool_kind, edgeType: item.edge_type, count: item.count });
  }
  return pairs;
}

import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { arrivalWindow, bookingCutoff, isBeforeCutoff, type BookingCutoffSetting } from '@keenroute/shared';
import type { DataSource, EntityManager } from 'typeorm';
import type { BusinessMoment } from './booking-clock';
import { BookingDays } from './booking-days';
import type { BookingDto, PublicBookingDto } from './dto/booking-response.dto';
import { Booking } from './entities/booking.entity';

interface PlaceRow {
  id: string;
  name: string;
  city: string;
}

interface ArrivalRow {
  route_day_id: string;
  stop_id: string;
  arrival: number;
}

/** Turns booking rows into their response shape: stop names, arrival windows, cutoffs and whether still changeable. */
@Injectable()
export class BookingViews {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly days: BookingDays,
  ) {}

  async one(id: string, manager: EntityManager = this.dataSource.manager): Promise<BookingDto> {
    const booking = await manager.getRepository(Booking).findOneOrFail({
      where: { id },
      relations: { items: true },
    });
    return (await this.many([booking], manager))[0]!;
  }

  async many(bookings: readonly Booking[], manager: EntityManager = this.dataSource.manager): Promise<BookingDto[]> {
    if (bookings.length === 0) return [];
    const stops = new Map(
      (
        await manager.query<PlaceRow[]>(`SELECT id, name, city FROM stops WHERE id = ANY($1)`, [
          [...new Set(bookings.map((b) => b.stopId))],
        ])
      ).map((row) => [row.id, row]),
    );
    const dayIds = [...new Set(bookings.flatMap((b) => (b.routeDayId ? [b.routeDayId] : [])))];
    const arrivals = new Map(
      (
        await manager.query<ArrivalRow[]>(
          `SELECT route_day_id, stop_id, arrival FROM route_day_stops WHERE route_day_id = ANY($1)`,
          [dayIds],
        )
      ).map((row) => [`${row.route_day_id}|${row.stop_id}`, row.arrival]),
    );
    const setting = await this.days.cutoffSetting(manager);
    const now = this.days.now();
    return bookings.map((booking) => toView(booking, stops.get(booking.stopId), arrivals, setting, now));
  }
}

function toView(
  booking: Booking,
  stop: PlaceRow | undefined,
  arrivals: Map<string, number>,
  setting: BookingCutoffSetting,
  now: BusinessMoment,
): BookingDto {
  const arrival = booking.routeDayId ? arrivals.get(`${booking.routeDayId}|${booking.stopId}`) : undefined;
  const cutoff = booking.day ? bookingCutoff(booking.day, setting) : null;
  const open = cutoff === null || isBeforeCutoff(now.date, now.minute, cutoff);
  return {
    id: booking.id,
    status: booking.status,
    stop: { id: booking.stopId, name: stop?.name ?? '', city: stop?.city ?? '' },
    day: booking.day,
    routeDayId: booking.routeDayId,
    arrivalWindow: arrival === undefined ? null : arrivalWindow(Math.min(arrival, 1439)),
    mailIn: booking.mailIn,
    name: booking.name,
    email: booking.email,
    phone: booking.phone,
    notes: booking.notes,
    items: [...booking.items]
      .sort((a, b) => a.position - b.position)
      .map((item) => ({ toolKind: item.toolKind, edgeType: item.edgeType, count: item.count })),
    estimateCents: booking.estimateCents,
    benchMinutes: booking.benchMinutes,
    cutoff,
    changeable: booking.status === 'booked' && open,
    consent: booking.consent,
    customerId: booking.customerId,
    ticketId: booking.ticketId,
    createdAt: booking.createdAt.toISOString(),
    cancelledAt: booking.cancelledAt ? booking.cancelledAt.toISOString() : null,
  };
}

/** What the customer's own link shows: no staff fields. */
export function toPublicBooking(view: BookingDto): PublicBookingDto {
  return {
    id: view.id,
    status: view.status,
    stop: view.stop,
    day: view.day,
    routeDayId: view.routeDayId,
    arrivalWindow: view.arrivalWindow,
    mailIn: view.mailIn,
    name: view.name,
    email: view.email,
    phone: view.phone,
    notes: view.notes,
    items: view.items,
    estimateCents: view.estimateCents,
    benchMinutes: view.benchMinutes,
    cutoff: view.cutoff,
    changeable: view.changeable,
  };
}

import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  DEFAULT_BOOKING_CUTOFF,
  arrivalWindow,
  bookableMinutes,
  bookingCutoff,
  isBeforeCutoff,
  type BookingCutoffSetting,
} from '@keenroute/shared';
import type { DataSource, EntityManager } from 'typeorm';
import { PlanningSettings } from '../route-days/entities/planning-settings.entity';
import { BookingClock, type BusinessMoment } from './booking-clock';
import type { PublicDayDto } from './dto/booking-response.dto';

interface DayRow {
  route_day_id: string;
  day: string;
  shift_start: number;
  latest_finish: number;
  lunch_minutes: number;
  drive_minutes: number;
  stop_id: string;
  arrival: number;
  stop_count: number;
  booked: number;
}

/** Route days a stop is on, with the bench minutes bookings already hold (a cancelled booking holds none). */
const DAY_ROWS = `
  SELECT rd.id AS route_day_id, rd.day::text AS day, rd.shift_start, rd.latest_finish, rd.lunch_minutes,
         rd.drive_minutes, rds.stop_id, rds.arrival,
         (SELECT count(*)::int FROM route_day_stops x WHERE x.route_day_id = rd.id) AS stop_count,
         (SELECT coalesce(sum(b.bench_minutes), 0)::int FROM bookings b
           WHERE b.route_day_id = rd.id AND b.status <> 'cancelled' AND b.id IS DISTINCT FROM $3::uuid) AS booked
    FROM route_day_stops rds JOIN route_days rd ON rd.id = rds.route_day_id`;

/** How far ahead the public page looks for a stop's route days. */
const UPCOMING_MAX = 20;

/** The route days open to bookings: their cutoff, arrival window and the bench minutes left to book. */
@Injectable()
export class BookingDays {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly clock: BookingClock,
  ) {}

  now(): BusinessMoment {
    return this.clock.moment();
  }

  async cutoffSetting(manager: EntityManager = this.dataSource.manager): Promise<BookingCutoffSetting> {
    const row = await manager.getRepository(PlanningSettings).findOneBy({ id: 1 });
    return row ? { daysBefore: row.bookingCutoffDaysBefore, hour: row.bookingCutoffHour } : DEFAULT_BOOKING_CUTOFF;
  }

  /** Each stop's route days from today on that are still before their cutoff, soonest first. */
  async upcoming(
    stopIds: readonly string[],
    excludeBookingId: string | null = null,
  ): Promise<Map<string, PublicDayDto[]>> {
    const byStop = new Map<string, PublicDayDto[]>();
    if (stopIds.length === 0) return byStop;
    const now = this.now();
    const setting = await this.cutoffSetting();
    const rows = await this.dataSource.query<DayRow[]>(
      `${DAY_ROWS} WHERE rds.stop_id = ANY($1) AND rd.day >= $2 ORDER BY rd.day, rd.shift_start, rd.id`,
      [stopIds, now.date, excludeBookingId],
    );
    for (const row of rows) {
      const day = toPublicDay(row, setting, now);
      const list = byStop.get(row.stop_id) ?? [];
      if (isBeforeCutoff(now.date, now.minute, day.cutoff) && list.length < UPCOMING_MAX) list.push(day);
      byStop.set(row.stop_id, list);
    }
    return byStop;
  }

  /** One route day as it stands for a stop, or null when the stop is not on it. Call under the day's lock. */
  async onDay(
    manager: EntityManager,
    routeDayId: string,
    stopId: string,
    excludeBookingId: string | null = null,
  ): Promise<PublicDayDto | null> {
    const [row] = await manager.query<DayRow[]>(`${DAY_ROWS} WHERE rds.stop_id = $1 AND rd.id = $2`, [
      stopId,
      routeDayId,
      excludeBookingId,
    ]);
    return row ? toPublicDay(row, await this.cutoffSetting(manager), this.now()) : null;
  }

  /** Holds the route day's row until the transaction ends, so two bookings cannot both take its last minutes. */
  async lock(manager: EntityManager, routeDayId: string): Promise<boolean> {
    const rows = await manager.query<{ id: string }[]>(`SELECT id FROM route_days WHERE id = $1 FOR UPDATE`, [
      routeDayId,
    ]);
    return rows.length > 0;
  }

  isOpen(cutoff: { date: string; minute: number }): boolean {
    const now = this.now();
    return isBeforeCutoff(now.date, now.minute, cutoff);
  }
}

function toPublicDay(row: DayRow, setting: BookingCutoffSetting, now: BusinessMoment): PublicDayDto {
  const cutoff = bookingCutoff(row.day, setting);
  const left = Math.max(
    0,
    bookableMinutes({
      shiftStart: row.shift_start,
      latestFinish: row.latest_finish,
      lunchMinutes: row.lunch_minutes,
      driveMinutes: row.drive_minutes,
      stopCount: row.stop_count,
    }) - row.booked,
  );
  return {
    routeDayId: row.route_day_id,
    day: row.day,
    arrivalWindow: arrivalWindow(Math.min(row.arrival, 1439)),
    bookableMinutesLeft: left,
    cutoff,
    open: left > 0 && isBeforeCutoff(now.date, now.minute, cutoff),
  };
}

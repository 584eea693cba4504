import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { addDays, arrivalWindow, daysOverdue, weekdayOf } from '@keenroute/shared';
import type { DataSource } from 'typeorm';
import { RouteDayAccess } from '../access/route-day-access';
import type { Actor } from '../auth/actor';
import { User } from '../users/entities/user.entity';
import {
  REASON_TEXT,
  type RouteDayDto,
  type RouteDayStopDto,
  type UnplannedDto,
  type WeekDto,
} from './dto/route-day-response.dto';
import type { ScheduleProblem } from './entities/route-day-stop.entity';
import { RouteDay } from './entities/route-day.entity';
import { RouteWeekPlan } from './entities/route-week-plan.entity';
import { NEXT_DUE_SQL, OWNER_SHARPENS } from './route-day-sql';

interface StopOnDayRow {
  route_day_id: string;
  stop_id: string;
  position: number;
  arrival: number;
  start: number;
  leave: number;
  bench_minutes: number;
  drive_minutes_before: number;
  km_before: number;
  locked: boolean;
  position_locked: boolean;
  problem: ScheduleProblem | null;
  name: string;
  street: string;
  city: string;
  latitude: number;
  longitude: number;
  next_due_on: string | null;
}

/** Reads route days into their response shape, always through the caller's access scope. */
@Injectable()
export class RouteDayReader {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly access: RouteDayAccess,
  ) {}

  async week(actor: Actor, weekStart: string, today: string, sharpenerId?: string): Promise<WeekDto> {
    const weekEnd = addDays(weekStart, 6);
    const query = this.access
      .scopeRouteDays(this.dataSource.getRepository(RouteDay).createQueryBuilder('day'), actor, 'day')
      .andWhere('day.day BETWEEN :weekStart AND :weekEnd', { weekStart, weekEnd });
    if (sharpenerId) query.andWhere('day.sharpenerId = :sharpenerId', { sharpenerId });
    const days = await this.toDtos(await query.getMany(), today);
    const plan = await this.dataSource.getRepository(RouteWeekPlan).findOneBy({ weekStart });
    return {
      weekStart,
      weekEnd,
      today,
      sharpeners: await this.sharpeners(actor, days),
      days,
      unplanned: await this.unplanned(actor, plan, weekStart, weekEnd),
      plannedAt: plan ? plan.plannedAt.toISOString() : null,
      solveMs: plan ? plan.solveMs : null,
    };
  }

  async days(ids: readonly string[], today: string): Promise<RouteDayDto[]> {
    if (ids.length === 0) return [];
    const rows = await this.dataSource
      .getRepository(RouteDay)
      .createQueryBuilder('day')
      .whereInIds([...ids])
      .getMany();
    return this.toDtos(rows, today);
  }

  private async toDtos(days: RouteDay[], today: string): Promise<RouteDayDto[]> {
    if (days.length === 0) return [];
    // The sharpeners' names and the days' stops do not depend on each other: read them at once.
    const [sharpeners, stops] = await Promise.all([
      this.dataSource.getRepository(User).findBy(days.map((d) => ({ id: d.sharpenerId }))),
      this.dataSource.query<StopOnDayRow[]>(
        `SELECT rds.route_day_id, rds.stop_id, rds.position, rds.arrival, rds.start, rds.leave, rds.bench_minutes,
                rds.drive_minutes_before, rds.km_before, rds.locked, rds.position_locked, rds.problem,
                s.name, s.street, s.city, s.latitude, s.longitude, ${NEXT_DUE_SQL('s', '$2')} AS next_due_on
           FROM route_day_stops rds JOIN stops s ON s.id = rds.stop_id
          WHERE rds.route_day_id = ANY($1)
          ORDER BY rds.route_day_id, rds.position`,
        [days.map((d) => d.id), today],
      ),
    ]);
    const names = new Map(sharpeners.map((u) => [u.id, u.name]));
    const byDay = new Map<string, RouteDayStopDto[]>();
    for (const row of stops) {
      const list = byDay.get(row.route_day_id) ?? [];
      list.push(toStopDto(row, today));
      byDay.set(row.route_day_id, list);
    }
    return days
      .map((day) => toDayDto(day, names.get(day.sharpenerId) ?? '', byDay.get(day.id) ?? []))
      .sort((a, b) => a.day.localeCompare(b.day) || a.sharpener.name.localeCompare(b.sharpener.name));
  }

  private async sharpeners(actor: Actor, days: RouteDayDto[]): Promise<{ id: string; name: string }[]> {
    if (!this.access.isPlanner(actor)) return [{ id: actor.id, name: actor.name }];
    const active = await this.dataSource
      .getRepository(User)
      .createQueryBuilder('u')
      .where('u.active')
      .andWhere(`(u.role = 'sharpener' OR (u.role = 'owner' AND ${OWNER_SHARPENS}))`)
      .getMany();
    const rows = new Map(active.map((u) => [u.id, u.name]));
    for (const day of days) rows.set(day.sharpener.id, day.sharpener.name);
    return [...rows].map(([id, name]) => ({ id, name })).sort((a, b) => a.name.localeCompare(b.name));
  }

  /** The last plan's unplanned stops still off every day of the week, that the caller may see. */
  private async unplanned(
    actor: Actor,
    plan: RouteWeekPlan | null,
    weekStart: string,
    weekEnd: string,
  ): Promise<UnplannedDto[]> {
    if (!plan || plan.unplanned.length === 0) return [];
    const rows = await this.dataSource.query<{ id: string; name: string; city: string }[]>(
      `SELECT s.id, s.name, s.city FROM stops s
        WHERE s.id = ANY($1)
          AND NOT EXISTS (SELECT 1 FROM route_day_stops rds JOIN route_days rd ON rd.id = rds.route_day_id
                           WHERE rds.stop_id = s.id AND rd.day BETWEEN $2 AND $3)
          AND ($4::uuid IS NULL OR s.assigned_sharpener_id = $4)`,
      [plan.unplanned.map((u) => u.stopId), weekStart, weekEnd, this.access.isPlanner(actor) ? null : actor.id],
    );
    const stops = new Map(rows.map((row) => [row.id, row]));
    return plan.unplanned.flatMap((u) => {
      const stop = stops.get(u.stopId);
      const reason = u.reason as keyof typeof REASON_TEXT;
      return stop
        ? [{ stopId: stop.id, name: stop.name, city: stop.city, reason, reasonText: REASON_TEXT[reason] }]
        : [];
    });
  }
}

function toStopDto(row: StopOnDayRow, today: string): RouteDayStopDto {
  return {
    stopId: row.stop_id,
    position: row.position,
    name: row.name,
    street: row.street,
    city: row.city,
    latitude: row.latitude,
    longitude: row.longitude,
    arrival: row.arrival,
    start: row.start,
    leave: row.leave,
    arrivalWindow: arrivalWindow(Math.min(row.arrival, 1439)),
    benchMinutes: row.bench_minutes,
    driveMinutesBefore: row.drive_minutes_before,
    kmBefore: Math.round(row.km_before * 10) / 10,
    locked: row.locked,
    positionLocked: row.position_locked,
    problem: row.problem,
    nextDueOn: row.next_due_on,
    daysOverdue: row.next_due_on ? Math.max(0, daysOverdue(row.next_due_on, today)) : 0,
  };
}

export function toDayDto(day: RouteDay, sharpenerName: string, stops: RouteDayStopDto[]): RouteDayDto {
  return {
    id: day.id,
    day: day.day,
    weekday: weekdayOf(day.day),
    sharpener: { id: day.sharpenerId, name: sharpenerName },
    start: { label: day.startLabel, latitude: day.startLatitude, longitude: day.startLongitude },
    shiftStart: day.shiftStart,
    latestFinish: day.latestFinish,
    lunch:
      day.lunchStart !== null && day.lunchAfter !== null
        ? { start: day.lunchStart, afterStops: day.lunchAfter, minutes: day.lunchMinutes }
        : null,
    departure: day.departure,
    finish: day.finish,
    distanceKm: Math.round(day.distanceKm * 10) / 10,
    driveMinutes: day.driveMinutes,
    benchMinutes: day.benchMinutes,
    version: day.version,
    stops,
  };
}

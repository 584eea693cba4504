import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { addDays, weekdayOf, type OpeningHours, type Weekday } from '@keenroute/shared';
import type { DataSource, EntityManager } from 'typeorm';
import type { Actor } from '../../auth/actor';
import { DomainError } from '../../common/errors/domain-error';
import { User } from '../../users/entities/user.entity';
import type { UnplannedStopReason } from '../dto/route-day-response.dto';
import type { PlanningSettings } from '../entities/planning-settings.entity';
import { RouteDayStop } from '../entities/route-day-stop.entity';
import { RouteDay } from '../entities/route-day.entity';
import { RouteWeekPlan, type UnplannedStop } from '../entities/route-week-plan.entity';
import { PlanningSettingsService } from '../planning-settings.service';
import { NEXT_DUE_SQL, OWNER_SHARPENS } from '../route-day-sql';
import type { SolverStop, Vehicle } from '../solver/types';
import { ExpectedBenchService } from './expected-bench';
import { SolverRunner } from './solver-runner';
import { benchWindows, candidateDates, isOpenOn } from './stop-windows';
import { TravelMatrixService } from './travel-matrix.service';

interface CandidateRow {
  id: string;
  latitude: number | null;
  longitude: number | null;
  opening_hours: OpeningHours;
  closed_dates: string[];
  preferred_weekdays: Weekday[];
  assigned_sharpener_id: string | null;
  next_due_on: string;
  locked_day: string | null;
  locked_sharpener: string | null;
  locked_position: number | null;
}

const vehicleId = (sharpenerId: string, date: string) => `${sharpenerId}|${date}`;

/**
 * "Plan the week": the stops coming due by the week's end (and every stop locked to a day of it) go to the chosen
 * sharpeners' work days by the route solver; locked stops keep their day (and position when locked so); the rest of
 * the week is planned afresh. One transaction, under a lock per week, so two planners never interleave.
 */
@Injectable()
export class WeekPlanner {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly settingsService: PlanningSettingsService,
    private readonly expectedBench: ExpectedBenchService,
    private readonly matrices: TravelMatrixService,
    private readonly solver: SolverRunner,
  ) {}

  async plan(actor: Actor, weekStart: string, today: string, sharpenerIds?: string[]): Promise<void> {
    const settings = await this.settingsService.require();
    const sharpeners = await this.sharpeners(sharpenerIds);
    const dates = [0, 1, 2, 3, 4, 5, 6]
      .map((offset) => addDays(weekStart, offset))
      .filter((date) => settings.workWeekdays.includes(weekdayOf(date)) && date >= today);
    if (dates.length === 0) {
      throw new DomainError('invalid_input', 'No work day of this week is left to plan: pick a later week.');
    }
    const ids = sharpeners.map((s) => s.id);
    const everyone = !sharpenerIds || sharpenerIds.length === 0;
    const candidates = await this.candidates(weekStart, addDays(weekStart, 6), ids, today, everyone);
    const bench = await this.expectedBench.forStops(candidates.map((c) => c.id));

    const unplanned: UnplannedStop[] = [];
    const placed: { row: CandidateRow; stop: SolverStop; place: number }[] = [];
    const points = [{ lat: settings.baseLatitude, lon: settings.baseLongitude }];
    for (const row of candidates) {
      const minutes = bench.get(row.id)?.minutes ?? 0;
      const reason = this.unplannable(row, dates, minutes);
      if (reason) {
        unplanned.push({ stopId: row.id, reason });
        continue;
      }
      const stop = this.solverStop(row, dates, ids, minutes, points.length, today);
      placed.push({ row, stop, place: points.length });
      points.push({ lat: row.latitude!, lon: row.longitude! });
    }
    const vehicles = sharpeners.flatMap((s) => dates.map((date) => vehicle(s.id, date, settings)));
    const matrix = await this.matrices.matrix(points, settings);
    const started = Date.now();
    const solution = await this.solver.solve({
      vehicles,
      stops: placed.map((p) => p.stop),
      matrix,
      timeLimitMs: settings.solveSeconds * 1000,
      // The planner waits for this: the setting is a promise about the wall clock, not only the solver's step budget.
      maxWallMs: settings.solveSeconds * 1000,
      seed: 1,
      objective: 'time',
    });
    const solveMs = Date.now() - started;
    for (const u of solution.unplanned) unplanned.push({ stopId: u.stopId, reason: u.reason });

    const locks = new Map(placed.map((p) => [p.row.id, p.row]));
    const benchOf = (stopId: string) => bench.get(stopId)?.minutes ?? 0;
    const placeOf = new Map(placed.map((p) => [p.row.id, p.place]));
    await this.dataSource.transaction(async (manager) => {
      await manager.query('SELECT pg_advisory_xact_lock(hashtext($1))', [`route-week:${weekStart}`]);
      const days = await this.upsertDays(manager, sharpeners, dates, settings);
      await manager.query(
        `DELETE FROM route_day_stops WHERE route_day_id = ANY($1)
            OR stop_id = ANY($2) AND route_day_id IN (SELECT id FROM route_days WHERE day BETWEEN $3 AND $4)`,
        [[...days.values()].map((d) => d.id), candidates.map((c) => c.id), today, addDays(weekStart, 6)],
      );
      for (const [key, day] of days) {
        const route = solution.routes.find((r) => r.vehicleId === key);
        const visits = route?.visits ?? [];
        let previous = 0;
        const rows = visits.map((visit, position) => {
          const here = placeOf.get(visit.stopId)!;
          const lock = locks.get(visit.stopId);
          const row = manager.create(RouteDayStop, {
            routeDayId: day.id,
            stopId: visit.stopId,
            position,
            arrival: Math.round(visit.arrival),
            start: Math.round(visit.start),
            leave: Math.round(visit.leave),
            benchMinutes: benchOf(visit.stopId),
            driveMinutesBefore: Math.round(matrix.minutes[previous]![here]!),
            kmBefore: matrix.km[previous]![here]!,
            problem: null,
            locked: lock?.locked_day !== null && lock?.locked_day !== undefined,
            positionLocked: lock?.locked_position !== null && lock?.locked_position !== undefined,
          });
          previous = here;
          return row;
        });
        if (rows.length > 0) await manager.save(rows);
        Object.assign(day, {
          lunchStart: route?.lunchStart !== undefined ? Math.round(route.lunchStart) : null,
          lunchAfter: route?.lunchAfterVisits ?? null,
          departure: route ? Math.round(route.departure) : null,
          finish: route ? Math.round(route.finish) : null,
          distanceKm: route?.distance ?? 0,
          driveMinutes: route ? Math.round(route.driveMinutes) : 0,
          benchMinutes: route ? Math.round(route.serviceMinutes) : 0,
        });
        await manager.save(day);
      }
      await manager.save(
        manager.create(RouteWeekPlan, { weekStart, unplanned, plannedBy: actor.id, solveMs, plannedAt: new Date() }),
      );
    });
  }

  /** Active sharpeners and owners who sharpen, or the given ones (which must be active sharpeners or owners). */
  private async sharpeners(ids?: string[]): Promise<User[]> {
    const users = this.dataSource.getRepository(User);
    if (!ids || ids.length === 0) {
      const all = await users
        .createQueryBuilder('u')
        .where('u.active')
        .andWhere(`(u.role = 'sharpener' OR (u.role = 'owner' AND ${OWNER_SHARPENS}))`)
        .orderBy('u.name')
        .getMany();
      if (all.length === 0) throw new DomainError('conflict', 'There is no active sharpener to plan for.');
      return all;
    }
    const found = await users
      .createQueryBuilder('u')
      .whereInIds([...new Set(ids)])
      .getMany();
    const ok = found.filter((u) => u.active && (u.role === 'sharpener' || u.role === 'owner'));
    if (ok.length !== new Set(ids).size) {
      throw new DomainError('invalid_input', 'Some fields need attention.', {
        sharpenerIds: ['Choose active sharpeners (or an owner who sharpens).'],
      });
    }
    return ok.sort((a, b) => a.name.localeCompare(b.name));
  }

  /**
   * Stops to plan: active, due by the week's end, assigned to one of these sharpeners (or to nobody, when planning
   * everyone), and not on
   * another sharpener's day that week nor on a day already past, nor already on a day of another week still to come; plus every stop locked to one of these sharpeners'
   * days still to come.
   */
  private candidates(weekStart: string, weekEnd: string, sharpenerIds: string[], today: string, unassigned: boolean) {
    return this.dataSource.query<CandidateRow[]>(
      `WITH week_stops AS (
         -- A stop with drop-offs booked for its day stays on that day: the customers were told it.
         SELECT rds.stop_id, rds.position_locked, rds.position, rd.day::text AS day, rd.sharpener_id,
                rds.locked OR EXISTS (SELECT 1 FROM bookings b WHERE b.route_day_id = rd.id AND b.stop_id = rds.stop_id
                                      AND b.status <> 'cancelled') AS locked
           FROM route_day_stops rds JOIN route_days rd ON rd.id = rds.route_day_id
          WHERE rd.day BETWEEN $1 AND $2)
       SELECT s.id, s.latitude, s.longitude, s.opening_hours, s.closed_dates::text[] AS closed_dates,
              s.preferred_weekdays, s.assigned_sharpener_id, ${NEXT_DUE_SQL('s', '$4')} AS next_due_on,
              CASE WHEN w.locked THEN w.day END AS locked_day,
              CASE WHEN w.locked THEN w.sharpener_id END AS locked_sharpener,
              CASE WHEN w.position_locked THEN w.position END AS locked_position
         FROM stops s LEFT JOIN week_stops w ON w.stop_id = s.id AND w.sharpener_id = ANY($3) AND w.day >= $4
        WHERE s.active
          AND NOT EXISTS (SELECT 1 FROM week_stops o
                           WHERE o.stop_id = s.id AND (NOT o.sharpener_id = ANY($3) OR o.day < $4))
          AND NOT EXISTS (SELECT 1 FROM route_day_stops x JOIN route_days xd ON xd.id = x.route_day_id
                           WHERE x.stop_id = s.id AND xd.day >= $4::date AND xd.day NOT BETWEEN $1 AND $2)
          AND (w.locked OR (
                ((s.assigned_sharpener_id IS NULL AND $5) OR s.assigned_sharpener_id = ANY($3))
                AND COALESCE((SELECT max(v.worked_on) FROM stop_visits v WHERE v.stop_id = s.id) + s.cadence_weeks * 7,
                             $4::date) <= $2::date))
        ORDER BY s.id`,
      [weekStart, weekEnd, sharpenerIds, today, unassigned],
    );
  }

  private unplannable(row: CandidateRow, dates: string[], benchMinutes: number): UnplannedStopReason | null {
    if (row.latitude === null || row.longitude === null) return 'no-coordinates';
    const calendar = calendarOf(row);
    if (!dates.some((date) => isOpenOn(calendar, date))) return 'closed-all-week';
    if (!dates.some((date) => benchWindows(calendar, date, benchMinutes).length > 0)) return 'window-closed';
    return null;
  }

  private solverStop(
    row: CandidateRow,
    dates: string[],
    sharpenerIds: string[],
    benchMinutes: number,
    place: number,
    today: string,
  ): SolverStop {
    const calendar = calendarOf(row);
    const who = row.locked_sharpener
      ? [row.locked_sharpener]
      : row.assigned_sharpener_id
        ? [row.assigned_sharpener_id]
        : sharpenerIds;
    const when = row.locked_day ? [row.locked_day] : candidateDates(calendar, dates);
    const vehicleWindows: Record<string, { open: number; close: number }[]> = {};
    for (const sharpenerId of who) {
      for (const date of when)
        vehicleWindows[vehicleId(sharpenerId, date)] = benchWindows(calendar, date, benchMinutes);
    }
    // Overdue stops first; a stop due later this week still counts, just less.
    const overdueDays = Math.round((Date.parse(today) - Date.parse(row.next_due_on)) / 86_400_000);
    return {
      id: row.id,
      place,
      windows: [],
      vehicleWindows,
      serviceMinutes: benchMinutes,
      priority: Math.max(0, overdueDays + 7),
      lock:
        row.locked_day && row.locked_sharpener
          ? {
              vehicleId: vehicleId(row.locked_sharpener, row.locked_day),
              ...(row.locked_position !== null ? { position: row.locked_position } : {}),
            }
          : undefined,
    };
  }

  private async upsertDays(
    manager: EntityManager,
    sharpeners: User[],
    dates: string[],
    settings: PlanningSettings,
  ): Promise<Map<string, RouteDay>> {
    const repo = manager.getRepository(RouteDay);
    const days = new Map<string, RouteDay>();
    for (const sharpener of sharpeners) {
      for (const date of dates) {
        const day =
          (await repo.findOneBy({ sharpenerId: sharpener.id, day: date })) ??
          repo.create({ sharpenerId: sharpener.id, day: date });
        Object.assign(day, {
          startLabel: settings.baseLabel,
          startLatitude: settings.baseLatitude,
          startLongitude: settings.baseLongitude,
          shiftStart: settings.shiftStart,
          latestFinish: settings.latestFinish,
          lunchEarliest: settings.lunchEarliest,
          lunchLatest: settings.lunchLatest,
          lunchMinutes: settings.lunchMinutes,
        });
        days.set(vehicleId(sharpener.id, date), await repo.save(day));
      }
    }
    return days;
  }
}

function calendarOf(row: CandidateRow) {
  return {
    openingHours: row.opening_hours,
    closedDates: row.closed_dates,
    preferredWeekdays: row.preferred_weekdays,
  };
}

function vehicle(sharpenerId: string, date: string, settings: PlanningSettings): Vehicle {
  return {
    id: vehicleId(sharpenerId, date),
    startPlace: 0,
    endPlace: 0,
    shiftStart: settings.shiftStart,
    latestFinish: settings.latestFinish,
    ...(settings.lunchMinutes > 0
      ? { lunch: { earliest: settings.lunchEarliest, latest: settings.lunchLatest, minutes: settings.lunchMinutes } }
      : {}),
  };
}

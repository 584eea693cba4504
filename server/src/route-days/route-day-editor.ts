import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { addDays, weekStart, type OpeningHours, type Weekday } from '@keenroute/shared';
import type { DataSource, EntityManager } from 'typeorm';
import { RouteDayAccess } from '../access/route-day-access';
import type { Actor } from '../auth/actor';
import { DomainError, notFound } from '../common/errors/domain-error';
import type { LockStopDto, PlaceStopDto } from './dto/place-stop.dto';
import { RouteDayStop } from './entities/route-day-stop.entity';
import { RouteDay } from './entities/route-day.entity';
import { RouteWeekPlan } from './entities/route-week-plan.entity';
import { PlanningSettingsService } from './planning-settings.service';
import { ExpectedBenchService } from './planning/expected-bench';
import { benchWindows } from './planning/stop-windows';
import { timeline, type TimelineStop } from './planning/timeline';
import { TravelMatrixService } from './planning/travel-matrix.service';

interface StopFacts {
  id: string;
  latitude: number | null;
  longitude: number | null;
  opening_hours: OpeningHours;
  closed_dates: string[];
  preferred_weekdays: Weekday[];
  active: boolean;
}

/**
 * Hand changes to route days: place a stop (re-order, move between days, add from the unplanned list), take one off,
 * lock and unlock. Every change re-times the days it touches at once, by the timeline (which marks broken rules rather
 * than refusing), in one transaction with the days' rows locked.
 */
@Injectable()
export class RouteDayEditor {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly access: RouteDayAccess,
    private readonly settings: PlanningSettingsService,
    private readonly expectedBench: ExpectedBenchService,
    private readonly matrices: TravelMatrixService,
  ) {}

  /** Returns the ids of the days that changed. */
  async place(actor: Actor, routeDayId: string, dto: PlaceStopDto): Promise<string[]> {
    const target = await this.access.requireRouteDay(actor, routeDayId, 'reorder');
    return this.dataSource.transaction(async (manager) => {
      const day = await this.lockDay(manager, target.id);
      if (dto.version !== undefined && dto.version !== day.version) {
        throw new DomainError('conflict', 'This route day changed since you opened it; reload to see the new order.');
      }
      const from = await this.findInWeek(manager, dto.stopId, day.day);
      if (from && from.routeDayId !== day.id) await this.lockDay(manager, from.routeDayId);
      if (!this.access.isPlanner(actor)) {
        const fromDay = from ? await manager.findOneBy(RouteDay, { id: from.routeDayId }) : null;
        if (!fromDay || fromDay.sharpenerId !== actor.id) {
          throw new DomainError('forbidden', 'You may re-order the stops on your own days; the office adds new ones.');
        }
      }
      if (from && from.routeDayId !== day.id) await this.refuseIfBooked(manager, from.routeDayId, dto.stopId);
      const stop = await this.stopFacts(manager, dto.stopId);
      if (!stop || !stop.active) throw notFound('The stop');
      if (stop.latitude === null || stop.longitude === null) {
        throw new DomainError('invalid_input', 'This stop has no map position yet: place its pin on the stop page.');
      }
      const bench = from?.benchMinutes ?? (await this.expectedBench.forStops([stop.id])).get(stop.id)!.minutes;
      if (from) await manager.delete(RouteDayStop, { id: from.id });
      const rest = (await this.stopsOf(manager, day.id)).filter((s) => s.stopId !== stop.id);
      const position = Math.min(dto.position, rest.length);
      // A stop placed by hand stays on its day when the week is planned again; its position only when locked so.
      const placed = manager.create(RouteDayStop, {
        routeDayId: day.id,
        stopId: stop.id,
        position,
        arrival: 0,
        start: 0,
        leave: 0,
        benchMinutes: bench,
        locked: true,
        positionLocked: from?.positionLocked ?? false,
      });
      rest.splice(position, 0, placed);
      await this.retime(manager, day, rest);
      const changed = [day.id];
      if (from && from.routeDayId !== day.id) {
        const old = await manager.findOneByOrFail(RouteDay, { id: from.routeDayId });
        await this.retime(manager, old, await this.stopsOf(manager, old.id));
        changed.push(old.id);
      }
      return changed;
    });
  }

  async remove(actor: Actor, routeDayId: string, stopId: string): Promise<string[]> {
    const target = await this.access.requireRouteDay(actor, routeDayId, 'plan');
    return this.dataSource.transaction(async (manager) => {
      const day = await this.lockDay(manager, target.id);
      const found = await manager.findOneBy(RouteDayStop, { routeDayId: day.id, stopId });
      if (!found) throw notFound('The stop on this route day');
      await this.refuseIfBooked(manager, day.id, stopId);
      await manager.delete(RouteDayStop, { id: found.id });
      await this.retime(manager, day, await this.stopsOf(manager, day.id));
      const week = weekStart(day.day);
      const plan =
        (await manager.findOneBy(RouteWeekPlan, { weekStart: week })) ??
        manager.create(RouteWeekPlan, { weekStart: week, unplanned: [], plannedBy: actor.id, solveMs: 0 });
      plan.unplanned = [...plan.unplanned.filter((u) => u.stopId !== stopId), { stopId, reason: 'taken-off' }];
      await manager.save(plan);
      return [day.id];
    });
  }

  async setLock(actor: Actor, routeDayId: string, stopId: string, lock: LockStopDto | null): Promise<void> {
    const target = await this.access.requireRouteDay(actor, routeDayId, 'reorder');
    await this.dataSource.transaction(async (manager) => {
      const day = await this.lockDay(manager, target.id);
      const found = await manager.findOneBy(RouteDayStop, { routeDayId: day.id, stopId });
      if (!found) throw notFound('The stop on this route day');
      found.locked = lock !== null;
      found.positionLocked = lock?.keepPosition ?? false;
      await manager.save(found);
      await manager.save(day); // bumps the version: the day changed
    });
  }

  /** Customers were told this day for their drop-offs: the stop stays until those bookings are moved or cancelled. */
  private async refuseIfBooked(manager: EntityManager, routeDayId: string, stopId: string): Promise<void> {
    const [row] = await manager.query<{ n: number }[]>(
      `SELECT count(*)::int AS n FROM bookings WHERE route_day_id = $1 AND stop_id = $2 AND status <> 'cancelled'`,
      [routeDayId, stopId],
    );
    if (row && row.n > 0) {
      throw new DomainError(
        'conflict',
        `${row.n} drop-off${row.n === 1 ? ' is' : 's are'} booked for this stop on this day: move or cancel ${row.n === 1 ? 'it' : 'them'} first.`,
      );
    }
  }

  private async lockDay(manager: EntityManager, id: string): Promise<RouteDay> {
    const day = await manager
      .getRepository(RouteDay)
      .createQueryBuilder('day')
      .setLock('pessimistic_write')
      .where('day.id = :id', { id })
      .getOne();
    if (!day) throw notFound('The route day');
    return day;
  }

  private findInWeek(manager: EntityManager, stopId: string, date: string): Promise<RouteDayStop | null> {
    const monday = weekStart(date);
    return manager
      .getRepository(RouteDayStop)
      .createQueryBuilder('rds')
      .innerJoin(RouteDay, 'rd', 'rd.id = rds.routeDayId')
      .where('rds.stopId = :stopId', { stopId })
      .andWhere('rd.day BETWEEN :monday AND :sunday', { monday, sunday: addDays(monday, 6) })
      .getOne();
  }

  private stopsOf(manager: EntityManager, routeDayId: string): Promise<RouteDayStop[]> {
    return manager.find(RouteDayStop, { where: { routeDayId }, order: { position: 'ASC' } });
  }

  private async stopFacts(manager: EntityManager, id: string): Promise<StopFacts | undefined> {
    const [row] = await manager.query<StopFacts[]>(
      `SELECT id, latitude, longitude, opening_hours, closed_dates::text[] AS closed_dates, preferred_weekdays, active
         FROM stops WHERE id = $1`,
      [id],
    );
    return row;
  }

  /** Re-numbers and re-times a day's stops in the given order, and saves them with the day's totals. */
  private async retime(manager: EntityManager, day: RouteDay, stops: RouteDayStop[]): Promise<void> {
    const settings = await this.settings.require();
    const facts = new Map<string, StopFacts>();
    for (const s of stops) facts.set(s.stopId, (await this.stopFacts(manager, s.stopId))!);
    const points = [
      { lat: day.startLatitude, lon: day.startLongitude },
      ...stops.map((s) => ({ lat: facts.get(s.stopId)!.latitude!, lon: facts.get(s.stopId)!.longitude! })),
    ];
    const matrix = await this.matrices.matrix(points, settings);
    const legs: TimelineStop[] = stops.map((s, i) => {
      const f = facts.get(s.stopId)!;
      const calendar = {
        openingHours: f.opening_hours,
        closedDates: f.closed_dates,
        preferredWeekdays: f.preferred_weekdays,
      };
      return {
        benchMinutes: s.benchMinutes,
        windows: benchWindows(calendar, day.day, s.benchMinutes),
        driveMinutes: matrix.minutes[i]![i + 1]!,
        km: matrix.km[i]![i + 1]!,
      };
    });
    const last = stops.length;
    const plan = timeline(
      {
        shiftStart: day.shiftStart,
        latestFinish: day.latestFinish,
        lunch:
          day.lunchMinutes > 0
            ? { earliest: day.lunchEarliest, latest: day.lunchLatest, minutes: day.lunchMinutes }
            : null,
      },
      legs,
      { driveMinutes: matrix.minutes[last]![0]!, km: matrix.km[last]![0]! },
    );
    // Positions are unique per day only by convention: clear, then write the new order.
    await manager.delete(RouteDayStop, { routeDayId: day.id });
    const rows = stops.map((s, i) =>
      manager.create(RouteDayStop, {
        ...s,
        id: undefined,
        routeDayId: day.id,
        position: i,
        arrival: plan.visits[i]!.arrival,
        start: plan.visits[i]!.start,
        leave: plan.visits[i]!.leave,
        driveMinutesBefore: Math.round(legs[i]!.driveMinutes),
        kmBefore: legs[i]!.km,
        problem: plan.visits[i]!.problem,
      }),
    );
    if (rows.length > 0) await manager.save(RouteDayStop, rows);
    Object.assign(day, {
      lunchStart: plan.lunch?.start ?? null,
      lunchAfter: plan.lunch?.afterStops ?? null,
      departure: plan.departure,
      finish: plan.finish,
      distanceKm: plan.distanceKm,
      driveMinutes: plan.driveMinutes,
      benchMinutes: plan.benchMinutes,
    });
    await manager.save(day);
  }
}

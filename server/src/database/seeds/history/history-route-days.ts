/**
 * The route days behind the history's visits: one per sharpener and day, its stops in nearest-neighbour order from
 * the base, timed by the same timeline the day editor uses (arrival, bench start inside opening hours, leave, the
 * break) over the planner's travel model (great-circle km x circuity at the average speed), home to the base included.
 */
import { randomUUID } from 'node:crypto';
import { addDays } from '@keenroute/shared';
import type { PlanningSettings } from '../../../route-days/entities/planning-settings.entity';
import type { RouteDayStop } from '../../../route-days/entities/route-day-stop.entity';
import type { RouteDay } from '../../../route-days/entities/route-day.entity';
import { benchWindows } from '../../../route-days/planning/stop-windows';
import { timeline, type DayFrame } from '../../../route-days/planning/timeline';
import { greatCircle, type MatrixArrays } from '../../../route-days/planning/travel-matrix.service';
import type { BusinessClock } from './business-time';
import type { HistoryStop } from './history-source';

export interface WorkedStop {
  stop: HistoryStop;
  day: string;
  sharpenerId: string;
  benchMinutes: number;
}

/** Where and when a visit sat on its route day: what its tickets' times hang on. */
export interface VisitSlot {
  routeDayId: string;
  start: number;
  leave: number;
}

export type RouteDayRow = Omit<RouteDay, 'version'>;
export type RouteDayStopRow = RouteDayStop;

export const visitKey = (stopId: string, day: string) => `${stopId}|${day}`;

/** Stop indexes (1-based into the matrix, 0 = the base) in the order a driver takes the nearest next stop. */
function nearestNeighbourOrder(matrix: MatrixArrays, count: number): number[] {
  const left = new Set(Array.from({ length: count }, (_, i) => i + 1));
  const order: number[] = [];
  let at = 0;
  while (left.size > 0) {
    let next = -1;
    for (const candidate of left) if (next < 0 || matrix.km[at]![candidate]! < matrix.km[at]![next]!) next = candidate;
    order.push(next);
    left.delete(next);
    at = next;
  }
  return order;
}

export function buildRouteDays(
  worked: readonly WorkedStop[],
  settings: PlanningSettings,
  clock: BusinessClock,
): { days: RouteDayRow[]; stops: RouteDayStopRow[]; slots: Map<string, VisitSlot> } {
  const groups = new Map<string, WorkedStop[]>();
  for (const visit of worked) {
    const key = `${visit.sharpenerId}|${visit.day}`;
    groups.set(key, [...(groups.get(key) ?? []), visit]);
  }
  const frame: DayFrame = {
    shiftStart: settings.shiftStart,
    latestFinish: settings.latestFinish,
    lunch:
      settings.lunchMinutes > 0
        ? { earliest: settings.lunchEarliest, latest: settings.lunchLatest, minutes: settings.lunchMinutes }
        : null,
  };
  const base = { lat: settings.baseLatitude, lon: settings.baseLongitude };
  const days: RouteDayRow[] = [];
  const stops: RouteDayStopRow[] = [];
  const slots = new Map<string, VisitSlot>();
  for (const visits of groups.values()) {
    const { day, sharpenerId } = visits[0]!;
    const matrix = greatCircle(
      [base, ...visits.map((v) => ({ lat: v.stop.latitude, lon: v.stop.longitude }))],
      settings,
    );
    const order = nearestNeighbourOrder(matrix, visits.length);
    const legs = order.map((place, i) => {
      const from = i === 0 ? 0 : order[i - 1]!;
      return { visit: visits[place - 1]!, minutes: matrix.minutes[from]![place]!, km: matrix.km[from]![place]! };
    });
    const last = order[order.length - 1]!;
    const times = timeline(
      frame,
      legs.map(({ visit, minutes, km }) => ({
        benchMinutes: visit.benchMinutes,
        windows: benchWindows(
          { openingHours: visit.stop.openingHours, closedDates: [], preferredWeekdays: [] },
          day,
          visit.benchMinutes,
        ),
        driveMinutes: minutes,
        km,
      })),
      { driveMinutes: matrix.minutes[last]![0]!, km: matrix.km[last]![0]! },
    );
    const id = randomUUID();
    days.push({
      id,
      sharpenerId,
      day,
      startLabel: settings.baseLabel,
      startLatitude: settings.baseLatitude,
      startLongitude: settings.baseLongitude,
      shiftStart: settings.shiftStart,
      latestFinish: settings.latestFinish,
      lunchEarliest: settings.lunchEarliest,
      lunchLatest: settings.lunchLatest,
      lunchMinutes: settings.lunchMinutes,
      lunchStart: times.lunch?.start ?? null,
      lunchAfter: times.lunch?.afterStops ?? null,
      departure: times.departure,
      finish: times.finish,
      distanceKm: times.distanceKm,
      driveMinutes: times.driveMinutes,
      benchMinutes: times.benchMinutes,
      // Planned the Friday before, as a week plan is; last touched when the day was driven.
      createdAt: clock.at(addDays(day, -3 - ((new Date(`${day}T12:00:00Z`).getUTCDay() + 6) % 7)), 15 * 60),
      updatedAt: clock.at(day, times.finish ?? settings.latestFinish),
    });
    legs.forEach(({ visit, minutes, km }, position) => {
      const at = times.visits[position]!;
      stops.push({
        id: randomUUID(),
        routeDayId: id,
        stopId: visit.stop.id,
        position,
        arrival: at.arrival,
        start: at.start,
        leave: at.leave,
        benchMinutes: visit.benchMinutes,
        driveMinutesBefore: Math.round(minutes),
        kmBefore: km,
        problem: at.problem,
        locked: false,
        positionLocked: false,
      });
      slots.set(visitKey(visit.stop.id, day), { routeDayId: id, start: at.start, leave: at.leave });
    });
  }
  return { days, stops, slots };
}

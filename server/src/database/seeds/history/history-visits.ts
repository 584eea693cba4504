/**
 * The stop visits of the history: each stop's recorded visits as they are, and older ones going back at its cadence,
 * a few days either way, now and then one to three weeks late. A visit goes to a day its sharpener already drives
 * nearby stops when one is close to the due date, so route days hold several stops, as planned weeks do.
 */
import { addDays, minutesOfDay, weekdayOf, type Weekday } from '@keenroute/shared';
import type { DemoRandom } from '../demo-random';
import { isDemoHoliday } from '../demo-stops';
import type { HistoryScale } from './history-options';
import type { HistoryStop, WorkedVisit } from './history-source';

export interface PlannedVisit {
  stopId: string;
  day: string;
  sharpenerId: string;
  /** Already in stop_visits (the registry's recent visits); the others are inserted. */
  recorded: boolean;
}

export interface VisitWindow {
  start: string;
  end: string;
  workWeekdays: readonly Weekday[];
}

/** Days either side of the due date a visit may move to, to share a route day. */
const SHIFT_DAYS = 3;
const JITTER_DAYS = 4;

const openOn = (stop: HistoryStop, day: string) => (stop.openingHours[weekdayOf(day)]?.length ?? 0) > 0;

/** The longest opening window that weekday, in minutes: a long visit goes where its bench work fits in one. */
function longestWindow(stop: HistoryStop, day: string): number {
  return Math.max(
    0,
    ...(stop.openingHours[weekdayOf(day)] ?? []).map(
      (window) => (minutesOfDay(window.closes) ?? 0) - (minutesOfDay(window.opens) ?? 0),
    ),
  );
}

class DayLoads {
  private readonly loads = new Map<string, { stops: number; bench: number }>();

  get(sharpenerId: string, day: string) {
    return this.loads.get(`${sharpenerId}|${day}`);
  }

  add(sharpenerId: string, day: string, bench: number): void {
    const load = this.get(sharpenerId, day) ?? { stops: 0, bench: 0 };
    this.loads.set(`${sharpenerId}|${day}`, { stops: load.stops + 1, bench: load.bench + bench });
  }
}

interface Pending {
  stop: HistoryStop;
  /** The visit after the one being placed. */
  later: string;
  due: string;
}

export class VisitPlanner {
  private readonly loads = new DayLoads();

  constructor(
    private readonly rng: DemoRandom,
    private readonly scale: HistoryScale,
    private readonly window: VisitWindow,
    /** Everyone who drives a route: a stop's visits go to its assigned sharpener, now and then to another. */
    private readonly sharpeners: readonly string[],
    /** Bench minutes a visit to the stop is expected to take, to keep route days within a working day. */
    private readonly expectedBench: ReadonlyMap<string, number>,
  ) {}

  plan(stops: readonly HistoryStop[], recorded: readonly WorkedVisit[]): PlannedVisit[] {
    const { start, end } = this.window;
    const visits: PlannedVisit[] = [];
    const pending: Pending[] = [];
    for (const stop of stops) {
      const own = recorded.filter((visit) => visit.stopId === stop.id && visit.day <= end);
      for (const visit of own) {
        const sharpenerId = visit.sharpenerId ?? stop.assignedSharpenerId ?? this.sharpeners[0]!;
        visits.push({ stopId: stop.id, day: visit.day, sharpenerId, recorded: true });
        this.loads.add(sharpenerId, visit.day, this.benchOf(stop));
      }
      let earliest = own[0]?.day ?? recorded.find((visit) => visit.stopId === stop.id)?.day;
      if (earliest === undefined) {
        if (!this.scale.visitUnvisitedStops) continue;
        // Never visited yet: the last visit falls within one cadence before the end, then the history goes back.
        const last = this.place(stop, addDays(end, -this.rng.int(0, stop.cadenceWeeks * 7 - 1)), end);
        if (!last) continue;
        visits.push(last);
        earliest = last.day;
      }
      pending.push({ stop, later: earliest, due: this.dueBefore(stop, earliest) });
    }
    // Latest first across all stops, so each visit sees the days already made around it.
    while (pending.length > 0) {
      let next = 0;
      for (let i = 1; i < pending.length; i++) if (pending[i]!.due > pending[next]!.due) next = i;
      const item = pending[next]!;
      if (item.due < start) {
        pending.splice(next, 1);
        continue;
      }
      // Never closer than a week (or a cadence less a week) to the visit after it.
      const latest = addDays(item.later, -Math.max(7, item.stop.cadenceWeeks * 7 - 7));
      const visit = this.place(item.stop, item.due, latest);
      const later = visit?.day ?? item.due;
      if (visit) visits.push(visit);
      pending[next] = { stop: item.stop, later, due: this.dueBefore(item.stop, later) };
    }
    return visits.sort((a, b) => a.day.localeCompare(b.day) || a.stopId.localeCompare(b.stopId));
  }

  /** The visit before one on `later`: a cadence earlier, give or take, and sometimes far enough back to be late. */
  private dueBefore(stop: HistoryStop, later: string): string {
    const late = this.rng.chance(this.scale.lateVisitChance) ? this.rng.int(7, 21) : 0;
    return addDays(later, -(stop.cadenceWeeks * 7 + this.rng.int(-JITTER_DAYS, JITTER_DAYS) + late));
  }

  private benchOf(stop: HistoryStop): number {
    return this.expectedBench.get(stop.id) ?? 60;
  }

  /**
   * The day near `due` this stop is worked, by whom, no later than `latest`; null when the stop is shut every day
   * around it. When its sharpener's days around then are full, a colleague with room takes the visit.
   */
  private place(stop: HistoryStop, due: string, latest: string): PlannedVisit | null {
    const bench = this.benchOf(stop);
    const chosen = this.sharpenerFor(stop);
    let best = this.bestDay(stop, chosen, due, latest, bench);
    if (best?.full) {
      for (const other of this.sharpeners) {
        const day = other === chosen ? null : this.bestDay(stop, other, due, latest, bench);
        if (day && !day.full && (best.full || day.score > best.score)) best = day;
      }
    }
    if (!best) return null;
    this.loads.add(best.sharpenerId, best.day, bench);
    return { stopId: stop.id, day: best.day, sharpenerId: best.sharpenerId, recorded: false };
  }

  private bestDay(stop: HistoryStop, sharpenerId: string, due: string, latest: string, bench: number) {
    let best: { day: string; sharpenerId: string; score: number; full: boolean } | null = null;
    for (let shift = -SHIFT_DAYS - 4; shift <= SHIFT_DAYS; shift++) {
      const day = addDays(due, shift);
      if (day > latest || day < this.window.start || day > this.window.end) continue;
      if (!openOn(stop, day) || isDemoHoliday(day) || !this.window.workWeekdays.includes(weekdayOf(day))) continue;
      // Days beyond the usual shift are a fallback for a stop shut most of the week.
      const distance = Math.abs(shift) + (shift < -SHIFT_DAYS ? 10 : 0);
      const load = this.loads.get(sharpenerId, day);
      const full =
        load !== undefined &&
        (load.stops >= this.scale.maxStopsPerDay || load.bench + bench > this.scale.benchBudgetMinutes);
      const fits = longestWindow(stop, day) >= bench ? 0 : -8;
      const score = fits + (full ? -100 - distance : load ? 4 + load.stops - distance : -distance);
      if (!best || score > best.score) best = { day, sharpenerId, score, full };
    }
    return best;
  }

  private sharpenerFor(stop: HistoryStop): string {
    const assigned = stop.assignedSharpenerId;
    const others = this.sharpeners.filter((id) => id !== assigned);
    if (assigned && (others.length === 0 || this.rng.chance(0.85))) return assigned;
    return this.rng.pick(others.length > 0 ? others : this.sharpeners);
  }
}

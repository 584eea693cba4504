import type { ScheduleProblem } from '../entities/route-day-stop.entity';
import type { TimeWindow } from '../solver/types';

/** A route day's frame: when the sharpener leaves and must be back, and the break. */
export interface DayFrame {
  shiftStart: number;
  latestFinish: number;
  lunch: { earliest: number; latest: number; minutes: number } | null;
}

export interface TimelineStop {
  benchMinutes: number;
  /** Start windows that day (bench minutes already taken off the closing); empty when shut. */
  windows: readonly TimeWindow[];
  /** Drive minutes and km from the place before (the base, or the previous stop). */
  driveMinutes: number;
  km: number;
}

export interface TimelineVisit {
  arrival: number;
  start: number;
  leave: number;
  problem: ScheduleProblem | null;
}

export interface Timeline {
  visits: TimelineVisit[];
  lunch: { start: number; afterStops: number; minutes: number } | null;
  departure: number | null;
  finish: number | null;
  distanceKm: number;
  driveMinutes: number;
  benchMinutes: number;
}

/**
 * Times for stops in a given order, as a person put them: never refuses, but marks each stop whose bench work starts
 * after closing, that is shut that day, or that runs the day past its latest finish. `back` is the drive home from the
 * last stop. The break is taken at the first stop left at or after the break's earliest start.
 */
export function timeline(
  frame: DayFrame,
  stops: readonly TimelineStop[],
  back: { driveMinutes: number; km: number },
): Timeline {
  if (stops.length === 0) {
    return { visits: [], lunch: null, departure: null, finish: null, distanceKm: 0, driveMinutes: 0, benchMinutes: 0 };
  }
  let t = frame.shiftStart;
  let lunch: Timeline['lunch'] = null;
  const takeLunch = (afterStops: number) => {
    if (!frame.lunch || lunch || frame.lunch.minutes === 0) return;
    const start = Math.max(t, frame.lunch.earliest);
    lunch = { start, afterStops, minutes: frame.lunch.minutes };
    t = start + frame.lunch.minutes;
  };
  const visits: TimelineVisit[] = [];
  let km = 0;
  let drive = 0;
  let bench = 0;
  stops.forEach((stop, index) => {
    if (frame.lunch && index > 0 && t >= frame.lunch.earliest) takeLunch(index);
    const arrival = Math.round(t + stop.driveMinutes);
    const window = stop.windows.find((w) => arrival <= w.close);
    const start = window ? Math.max(arrival, window.open) : arrival;
    const problem: ScheduleProblem | null =
      stop.windows.length === 0 ? 'closed-that-day' : window ? null : 'after-closing';
    t = start + stop.benchMinutes;
    visits.push({ arrival, start, leave: t, problem });
    km += stop.km;
    drive += stop.driveMinutes;
    bench += stop.benchMinutes;
  });
  takeLunch(stops.length);
  const finish = Math.round(t + back.driveMinutes);
  if (finish > frame.latestFinish) {
    for (const visit of visits) if (visit.leave > frame.latestFinish) visit.problem ??= 'day-too-long';
    const last = visits[visits.length - 1]!;
    if (!visits.some((visit) => visit.problem === 'day-too-long')) last.problem ??= 'day-too-long';
  }
  return {
    visits,
    lunch,
    departure: frame.shiftStart,
    finish,
    distanceKm: km + back.km,
    driveMinutes: Math.round(drive + back.driveMinutes),
    benchMinutes: bench,
  };
}

import type { RouteDay, RouteDayStop, UnplannedStop, Week } from './types';

/** Puts the server's fresh copies of the changed days in the week; a stop now on a day leaves the unplanned list. */
export function replaceDays(week: Week, changed: readonly RouteDay[]): Week {
  const byId = new Map(changed.map((day) => [day.id, day]));
  const placed = new Set(changed.flatMap((day) => day.stops.map((stop) => stop.stopId)));
  return {
    ...week,
    days: week.days.map((day) => byId.get(day.id) ?? day),
    unplanned: week.unplanned.filter((stop) => !placed.has(stop.stopId)),
  };
}

export interface StopMove {
  stopId: string;
  dayId: string;
  /** 0-based, in the day's order after the move. */
  position: number;
}

const renumber = (stops: RouteDayStop[]): RouteDayStop[] => stops.map((stop, index) => ({ ...stop, position: index }));

// Until the server answers, a stop from the unplanned list sits at the base with the times of the stop before it.
function placeholderFor(unplanned: UnplannedStop, day: RouteDay, before: RouteDayStop | undefined): RouteDayStop {
  const at = before?.leave ?? day.departure ?? day.shiftStart;
  return {
    stopId: unplanned.stopId,
    position: 0,
    name: unplanned.name,
    street: '',
    city: unplanned.city,
    latitude: day.start.latitude,
    longitude: day.start.longitude,
    arrival: at,
    start: at,
    leave: at,
    arrivalWindow: { from: at, to: at },
    benchMinutes: 0,
    driveMinutesBefore: 0,
    kmBefore: 0,
    locked: true,
    positionLocked: true,
    problem: null,
    nextDueOn: null,
    daysOverdue: 0,
  };
}

/** The week as it will look once the move is made, shown at once while the server recomputes the times. */
export function moveStop(week: Week, move: StopMove): Week {
  const target = week.days.find((day) => day.id === move.dayId);
  if (!target) return week;
  const fromDay = week.days.find((day) => day.stops.some((stop) => stop.stopId === move.stopId));
  const moving = fromDay?.stops.find((stop) => stop.stopId === move.stopId);
  const unplanned = week.unplanned.find((stop) => stop.stopId === move.stopId);
  if (!moving && !unplanned) return week;

  const days = week.days.map((day) => {
    const without = day.stops.filter((stop) => stop.stopId !== move.stopId);
    if (day.id !== target.id) return without.length === day.stops.length ? day : { ...day, stops: renumber(without) };
    const position = Math.min(Math.max(move.position, 0), without.length);
    const placed = moving
      ? { ...moving, locked: true, positionLocked: true }
      : placeholderFor(unplanned as UnplannedStop, day, without[position - 1]);
    return { ...day, stops: renumber([...without.slice(0, position), placed, ...without.slice(position)]) };
  });
  return { ...week, days, unplanned: week.unplanned.filter((stop) => stop.stopId !== move.stopId) };
}

/** Where a stop is in the week: its day and place, or null when it is on the unplanned list. */
export function whereIs(week: Week, stopId: string): { day: RouteDay; index: number } | null {
  for (const day of week.days) {
    const index = day.stops.findIndex((stop) => stop.stopId === stopId);
    if (index >= 0) return { day, index };
  }
  return null;
}

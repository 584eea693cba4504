/** Calendar arithmetic on "YYYY-MM-DD" dates, in whole days; no clock or time zone is involved. */
function toDayNumber(isoDate: string): number {
  const [y, m, d] = isoDate.split('-').map(Number) as [number, number, number];
  return Date.UTC(y, m - 1, d) / 86_400_000;
}

function fromDayNumber(day: number): string {
  return new Date(day * 86_400_000).toISOString().slice(0, 10);
}

export function addDays(isoDate: string, days: number): string {
  return fromDayNumber(toDayNumber(isoDate) + days);
}

export function daysBetween(from: string, to: string): number {
  return toDayNumber(to) - toDayNumber(from);
}

/** The Monday of the ISO week a date falls in. */
export function weekStart(isoDate: string): string {
  const day = toDayNumber(isoDate);
  // 1970-01-01 was a Thursday: day 0 is weekday index 3 counting Monday as 0.
  return fromDayNumber(day - ((((day + 3) % 7) + 7) % 7));
}

/** A stop's next visit falls due one cadence after the last worked visit; a stop never visited is due now. */
export function nextDueDate(lastVisitOn: string | null, cadenceWeeks: number, today: string): string {
  return lastVisitOn === null ? today : addDays(lastVisitOn, cadenceWeeks * 7);
}

/** Days past due (positive), or days still to go (negative). */
export function daysOverdue(nextDueOn: string, today: string): number {
  return daysBetween(nextDueOn, today);
}

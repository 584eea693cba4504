/** A period of calendar days, as the statement and CSV routes take it (?from=YYYY-MM-DD&to=YYYY-MM-DD). */
export interface DayRange {
  from: string;
  to: string;
}

/** Why the range cannot be asked for, in words; null when it can. ISO dates compare as strings. */
export function rangeProblem(from: string, to: string): string | null {
  if (!from || !to) return 'Choose both dates.';
  if (from > to) return 'The first day must come before the last.';
  return null;
}

/** 1 January of today's year up to today: the span a customer usually asks "what do I owe" about. */
export function yearToDate(today: string): DayRange {
  return { from: `${today.slice(0, 4)}-01-01`, to: today };
}

/**
 * Where the server sends no totals row (months, route days, edge types, tool kinds), the page adds up the columns
 * that add up; a ratio (per visit, per route hour, an average) is not a sum, so its total cell stays empty.
 */
export function sumsOf<Row>(rows: readonly Row[], keys: readonly (keyof Row)[]): Partial<Row> {
  const sums: Partial<Record<keyof Row, number | null>> = {};
  for (const key of keys) {
    let total: number | null = 0;
    for (const row of rows) {
      const value = row[key] as number | null;
      total = value === null || total === null ? null : total + value;
    }
    // Drive minutes and km come with one decimal: the sum keeps one, without floating-point dust.
    sums[key] = total === null ? null : Math.round(total * 10) / 10;
  }
  return sums as Partial<Row>;
}

/** A totals cell: the figure formatted, or nothing where the totals row has no such figure. */
export function totalCell<T>(value: T | undefined, format: (value: T) => string): string | null {
  return value === undefined ? null : format(value);
}

/** The reports' rows as the API answers them (camelCase of the SQL's columns); money in cents, time in minutes. */

export interface RevenueFigures {
  visits: number;
  tickets: number;
  shears: number;
  revenueCents: number;
  benchMinutes: number;
  driveMinutes: number;
  routeMinutes: number;
  km: number;
  perVisitCents: number | null;
  perBenchHourCents: number | null;
  perRouteHourCents: number | null;
  perKmCents: number | null;
  shearsPerVisit: number | null;
}

export interface StopRevenueRow extends RevenueFigures {
  stopId: string;
  stopName: string;
  city: string;
  cadenceWeeks: number;
}

export interface RouteDayRevenueRow extends RevenueFigures {
  routeDayId: string;
  day: string;
  sharpenerId: string;
  sharpenerName: string;
  stops: number;
}

export interface SharpenerRevenueRow extends RevenueFigures {
  sharpenerId: string | null;
  sharpenerName: string | null;
  routeDays: number;
}

export interface MonthRow {
  month: string;
  visits: number;
  tickets: number;
  shears: number;
  revenueCents: number;
  perVisitCents: number | null;
  invoicedCents: number | null;
  collectedCents: number | null;
}

export interface EdgeTypeRow {
  edgeType: string;
  lines: number;
  revenueCents: number;
  averageCents: number | null;
  shareBp: number;
}

export interface ToolKindRow extends Omit<EdgeTypeRow, 'edgeType'> {
  toolKind: string;
}

export interface ReceivablesRow {
  key: string;
  name: string;
  stopName: string | null;
  invoices: number;
  currentCents: number;
  days1to30Cents: number;
  days31to60Cents: number;
  days61to90Cents: number;
  over90Cents: number;
  totalCents: number;
}

export interface CadenceRow {
  stopId: string;
  stopName: string;
  sharpenerId: string | null;
  sharpenerName: string | null;
  cadenceWeeks: number;
  visits: number;
  onTime: number;
  late: number;
  averageGapDays: number | null;
  worstLateDays: number;
}

export type CadenceSharpenerRow = Pick<CadenceRow, 'sharpenerId' | 'sharpenerName' | 'visits' | 'onTime' | 'late'>;

/** "per_route_hour_cents" → "perRouteHourCents", "days_1_to_30_cents" → "days1to30Cents". */
export function camelKey(column: string): string {
  return column.replace(/_(\d+)_to_(\d+)/g, '$1to$2').replace(/_([a-z0-9])/g, (_, c: string) => c.toUpperCase());
}

export function camelRow<T>(row: Record<string, unknown>, drop: readonly string[] = []): T {
  const out: Record<string, unknown> = {};
  for (const [column, value] of Object.entries(row)) if (!drop.includes(column)) out[camelKey(column)] = value;
  return out as T;
}

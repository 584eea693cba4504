// The revenue reports' shapes, as the contract for issue 8 sets them (server/src/reports). Money in integer cents,
// time in minutes; null where a figure would divide by zero.

/** The filters every report takes: calendar days "YYYY-MM-DD", inclusive, and one sharpener's work or everyone's. */
export interface ReportParams {
  from: string;
  to: string;
  sharpenerId?: string;
}

/** Every report's answer: the range it covers (defaults filled in), its rows and, for most, a totals row. */
export interface ReportAnswer<Row, Totals = never> {
  from: string;
  to: string;
  sharpenerId: string | null;
  rows: Row[];
  totals?: Totals;
}

/** The figures of a stop's (or all stops') revenue against the time and distance it took. */
export interface StopFigures {
  visits: number;
  shears: number;
  revenueCents: number;
  benchMinutes: number;
  /** The stop's share of its route days' drive, one decimal. */
  driveMinutes: number;
  /** Bench time plus the drive share. */
  routeMinutes: number;
  km: number;
  perVisitCents: number | null;
  perBenchHourCents: number | null;
  perRouteHourCents: number | null;
  perKmCents: number | null;
  shearsPerVisit: number | null;
}

/** GET /api/reports/stops: a row per stop, most revenue first. */
export interface StopRevenueRow extends StopFigures {
  stopId: string;
  stopName: string;
  city: string;
  cadenceWeeks: number;
}

export type StopsReport = ReportAnswer<StopRevenueRow, StopFigures>;

/** GET /api/reports/months: every month of the range, months without work included. */
export interface MonthRow {
  month: string;
  visits: number;
  tickets: number;
  shears: number;
  revenueCents: number;
  perVisitCents: number | null;
  /** Null for one stop's trend: invoices belong to whoever pays, not to a stop. */
  invoicedCents: number | null;
  collectedCents: number | null;
}

export type MonthsReport = ReportAnswer<MonthRow, Omit<MonthRow, 'month'>>;

/** GET /api/reports/route-days: a row per route day, latest first. */
export interface RouteDayRevenueRow {
  routeDayId: string;
  day: string;
  sharpenerId: string;
  sharpenerName: string;
  stops: number;
  visits: number;
  shears: number;
  revenueCents: number;
  benchMinutes: number;
  driveMinutes: number;
  km: number;
  routeMinutes: number;
  perRouteHourCents: number | null;
}

export type RouteDaysReport = ReportAnswer<
  RouteDayRevenueRow,
  Omit<RouteDayRevenueRow, 'routeDayId' | 'day' | 'sharpenerId' | 'sharpenerName'>
>;

/** GET /api/reports/sharpeners. */
export interface SharpenerRevenueRow {
  sharpenerId: string | null;
  sharpenerName: string | null;
  routeDays: number;
  visits: number;
  shears: number;
  revenueCents: number;
  benchMinutes: number;
  driveMinutes: number;
  km: number;
  routeMinutes: number;
  perRouteHourCents: number | null;
  perVisitCents: number | null;
}

export type SharpenersReport = ReportAnswer<
  SharpenerRevenueRow,
  Omit<SharpenerRevenueRow, 'sharpenerId' | 'sharpenerName'>
>;

/** Shear lines only, at the price after any override; shareBp is the share of those lines' revenue. */
export interface LineShare {
  lines: number;
  revenueCents: number;
  averageCents: number | null;
  shareBp: number;
}

export interface EdgeTypeRow extends LineShare {
  edgeType: string;
}

export interface ToolKindRow extends LineShare {
  toolKind: string;
}

export type EdgeTypesReport = ReportAnswer<EdgeTypeRow, LineShare>;
export type ToolKindsReport = ReportAnswer<ToolKindRow, LineShare>;

export const RECEIVABLES_GROUPS = ['customer', 'stop'] as const;
export type ReceivablesGroup = (typeof RECEIVABLES_GROUPS)[number];

/** The cadence page's two tables; the CSV route takes `groupBy=sharpener` for the second. */
export type CadenceGroup = 'stop' | 'sharpener';

/** What is owed, by how long past due, for one bill-to party or one stop. */
export interface AgeingFigures {
  invoices: number;
  currentCents: number;
  days1to30Cents: number;
  days31to60Cents: number;
  days61to90Cents: number;
  over90Cents: number;
  totalCents: number;
}

export interface ReceivablesRow extends AgeingFigures {
  key: string;
  name: string;
  stopName: string | null;
}

/** GET /api/reports/receivables: ageing as of `to`; `from` and the sharpener are ignored. */
export interface ReceivablesReport extends ReportAnswer<ReceivablesRow, AgeingFigures> {
  asOf: string;
  groupBy: ReceivablesGroup;
}

/** GET /api/reports/cadence: visits on time against the stop's cadence plus the grace days. */
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

export interface CadenceReport extends ReportAnswer<CadenceRow> {
  bySharpener: CadenceSharpenerRow[];
  graceDays: number;
}

/** A change that would make a stop pay better for the drive, with the stop's revenue per route hour after it. */
export type DriveSuggestion =
  | {
      kind: 'longer-cadence';
      cadenceWeeks: number;
      newCadenceWeeks: number;
      driveMinutesSavedPerYear: number;
      perRouteHourCents: number;
    }
  | {
      kind: 'pair-with-neighbour';
      neighbourStopId: string;
      neighbourName: string;
      distanceKm: number;
      driveMinutesSavedPerVisit: number;
      perRouteHourCents: number;
    }
  | { kind: 'trip-charge'; tripChargeCents: number; perRouteHourCents: number };

export interface DriveCostRow {
  stopId: string;
  stopName: string;
  city: string;
  cadenceWeeks: number;
  visits: number;
  revenueCents: number;
  routeMinutes: number;
  driveMinutes: number;
  perRouteHourCents: number;
  suggestions: DriveSuggestion[];
}

/** GET /api/reports/drive-cost: the ten stops with the lowest revenue per route hour (two visits or more). */
export interface DriveCostReport extends ReportAnswer<DriveCostRow> {
  /** Null while no stop qualifies. */
  medianPerRouteHourCents: number | null;
}

/** The reports that have a CSV twin at GET /api/reports/<name>/csv. */
export const REPORT_NAMES = [
  'stops',
  'months',
  'route-days',
  'sharpeners',
  'edge-types',
  'tool-kinds',
  'receivables',
  'cadence',
  'drive-cost',
] as const;
export type ReportName = (typeof REPORT_NAMES)[number];

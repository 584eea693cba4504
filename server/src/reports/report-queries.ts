import type { ReceivablesGroup } from './dto/report-query.dto';
import { CADENCE_SQL } from './queries/cadence.sql';
import { DRIVE_COST_SQL } from './queries/drive-cost.sql';
import { MONTHS_SQL } from './queries/months.sql';
import { receivablesSql } from './queries/receivables.sql';
import { ROUTE_DAYS_SQL } from './queries/route-days.sql';
import { SHARPENERS_SQL } from './queries/sharpeners.sql';
import { shearLinesSql } from './queries/shear-lines.sql';
import { STOPS_SQL } from './queries/stops.sql';
import type { ReportRange } from './report-range';

/** A visit within a week of its due date counts as kept (common practice; no published source). */
export const CADENCE_GRACE_DAYS = 7;
/** A stop is judged on its drive cost only once it has had this many visits in the range. */
export const DRIVE_COST_MIN_VISITS = 2;

export interface ReportOptions {
  timeZone: string;
  stopId?: string | null;
  groupBy?: ReceivablesGroup;
}

export interface SqlQuery {
  sql: string;
  params: unknown[];
}

const base = (range: ReportRange) => [range.from, range.to, range.sharpenerId, range.routeTo];
/** The shear-line reports read no route days, so they take no last route day. */
const lineParams = (range: ReportRange) => [range.from, range.to, range.sharpenerId];

/**
 * Every report's SQL with its parameters: what the service runs, and what the report benchmark EXPLAINs. The names
 * are the reports' route names.
 */
export const REPORT_QUERIES = {
  stops: (range: ReportRange): SqlQuery => ({ sql: STOPS_SQL, params: base(range) }),
  months: (range: ReportRange, options: ReportOptions): SqlQuery => ({
    sql: MONTHS_SQL,
    params: [...base(range), options.stopId ?? null, options.timeZone],
  }),
  'route-days': (range: ReportRange): SqlQuery => ({ sql: ROUTE_DAYS_SQL, params: base(range) }),
  sharpeners: (range: ReportRange): SqlQuery => ({ sql: SHARPENERS_SQL, params: base(range) }),
  'edge-types': (range: ReportRange): SqlQuery => ({ sql: shearLinesSql('edge_type'), params: lineParams(range) }),
  'tool-kinds': (range: ReportRange): SqlQuery => ({ sql: shearLinesSql('tool_kind'), params: lineParams(range) }),
  receivables: (range: ReportRange, options: ReportOptions): SqlQuery => ({
    sql: receivablesSql(options.groupBy ?? 'customer'),
    params: [range.to, options.timeZone],
  }),
  cadence: (range: ReportRange): SqlQuery => ({
    sql: CADENCE_SQL,
    params: [range.from, range.to, range.sharpenerId, CADENCE_GRACE_DAYS],
  }),
  'drive-cost': (range: ReportRange): SqlQuery => ({
    sql: DRIVE_COST_SQL,
    params: [...base(range), DRIVE_COST_MIN_VISITS],
  }),
} satisfies Record<string, (range: ReportRange, options: ReportOptions) => SqlQuery>;

export type ReportName = keyof typeof REPORT_QUERIES;
export const REPORT_NAMES = Object.keys(REPORT_QUERIES) as ReportName[];

import type { CadenceGroup, ReceivablesGroup, ReportName, ReportParams } from '../types';

/** Query string values beyond the common filters: a stop's trend, which table of receivables or cadence. */
export type ReportExtra = { stopId?: string; groupBy?: ReceivablesGroup | CadenceGroup };

export const reportKeys = {
  all: ['reports'] as const,
  report: (name: ReportName, params: ReportParams, extra: ReportExtra = {}) =>
    ['reports', name, params, extra] as const,
};

/** The JSON route of a report, and its CSV twin with the same query. */
export const reportPath = (name: ReportName) => `/reports/${name}`;
export const reportCsvPath = (name: ReportName) => `/reports/${name}/csv`;

/** The common filters and the extras as the API reads them; an empty sharpener means everyone. */
export function reportQuery(params: ReportParams, extra: ReportExtra = {}) {
  return { from: params.from, to: params.to, sharpenerId: params.sharpenerId || undefined, ...extra };
}

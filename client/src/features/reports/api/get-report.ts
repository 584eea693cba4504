import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { ReportName, ReportParams } from '../types';
import { reportKeys, reportPath, reportQuery, type ReportExtra } from './keys';

export function getReport<T>(
  name: ReportName,
  params: ReportParams,
  extra: ReportExtra = {},
  signal?: AbortSignal,
): Promise<T> {
  return api.get<T>(reportPath(name), { query: reportQuery(params, extra), signal });
}

/** One report's query; each report's own file names its answer type. */
export function reportQueryOptions<T>(name: ReportName, params: ReportParams, extra: ReportExtra = {}) {
  return queryOptions({
    queryKey: reportKeys.report(name, params, extra),
    queryFn: ({ signal }) => getReport<T>(name, params, extra, signal),
    // Another range or sharpener shows over the last figures instead of a blank page.
    placeholderData: keepPreviousData,
    // Every report page says itself, in place, why its figures did not come.
    meta: { handlesError: () => true },
  });
}

import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Week } from '../types';
import { weekQueryKey } from './keys';

export interface WeekParams {
  /** The Monday of the week (any day of it would do for the server). */
  week: string;
  sharpenerId?: string;
}

export function getWeek({ week, sharpenerId }: WeekParams, signal?: AbortSignal): Promise<Week> {
  return api.get<Week>('/route-days', { query: { week, sharpenerId }, signal });
}

export function getWeekQueryOptions(params: WeekParams) {
  return queryOptions({
    queryKey: weekQueryKey(params.week, params.sharpenerId),
    queryFn: ({ signal }) => getWeek(params, signal),
    placeholderData: keepPreviousData,
  });
}

export function useWeek(params: WeekParams) {
  return useQuery(getWeekQueryOptions(params));
}

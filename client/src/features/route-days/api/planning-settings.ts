import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { PlanningSettings } from '../types';
import { settingsQueryKey } from './keys';

export function getPlanningSettings(signal?: AbortSignal): Promise<PlanningSettings> {
  return api.get<PlanningSettings>('/route-days/settings', { signal });
}

export function getPlanningSettingsQueryOptions() {
  return queryOptions({ queryKey: settingsQueryKey, queryFn: ({ signal }) => getPlanningSettings(signal) });
}

export function usePlanningSettings(enabled = true) {
  return useQuery({ ...getPlanningSettingsQueryOptions(), enabled });
}

export function savePlanningSettings(settings: PlanningSettings): Promise<PlanningSettings> {
  return api.put<PlanningSettings>('/route-days/settings', settings);
}

export function useSavePlanningSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: savePlanningSettings,
    onSuccess: (saved) => queryClient.setQueryData(settingsQueryKey, saved),
    meta: { handlesError: (error) => error.hasFieldErrors },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { PlanWeekInput, Week } from '../types';
import { weekQueryKey } from './keys';

export function planWeek(input: PlanWeekInput): Promise<Week> {
  return api.post<Week>('/route-days/plan', input);
}

/** The plan replaces the week on screen: the answer is the whole new week, so nothing needs reading again. */
export function usePlanWeek(sharpenerId = '') {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: planWeek,
    onSuccess: (week, input) => {
      queryClient.setQueryData(weekQueryKey(input.week, sharpenerId), week);
    },
  });
}

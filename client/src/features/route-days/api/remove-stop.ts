import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { ChangedDays } from '../types';
import { weekQueryPrefix } from './keys';

export interface RemoveStopVariables {
  routeDayId: string;
  stopId: string;
  monday: string;
}

export function removeStop({ routeDayId, stopId }: RemoveStopVariables): Promise<ChangedDays> {
  return api.delete<ChangedDays>(`/route-days/${encodeURIComponent(routeDayId)}/stops/${encodeURIComponent(stopId)}`);
}

/** Takes a stop off its day; the week is read again so the stop shows on the unplanned list with the server's reason. */
export function useRemoveStop() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeStop,
    onSuccess: (_changed, { monday }) => queryClient.invalidateQueries({ queryKey: weekQueryPrefix(monday) }),
  });
}

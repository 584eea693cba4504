import { useMutation, useQueryClient, type QueryKey } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { RouteDay, Week } from '../types';
import { replaceDays } from '../week-cache';

export interface LockStopVariables {
  routeDayId: string;
  stopId: string;
  locked: boolean;
}

/** Locks a stop to its day (the planner keeps it there) or unlocks it; answers the day as it is now. */
export function setStopLock({ routeDayId, stopId, locked }: LockStopVariables): Promise<RouteDay> {
  const path = `/route-days/${encodeURIComponent(routeDayId)}/stops/${encodeURIComponent(stopId)}`;
  // The lock icon keeps the stop on its day; the planner may still change its place in the order.
  return locked ? api.post<RouteDay>(`${path}/lock`, { keepPosition: false }) : api.post<RouteDay>(`${path}/unlock`);
}

export function useStopLock(weekKey: QueryKey) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setStopLock,
    onSuccess: (day) => {
      queryClient.setQueryData<Week>(weekKey, (week) => (week ? replaceDays(week, [day]) : week));
    },
  });
}

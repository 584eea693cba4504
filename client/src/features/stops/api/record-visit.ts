import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { RecordVisitInput, StopVisit } from '../types';
import { stopsQueryKey } from './get-stops';

export interface RecordVisitVariables {
  stopId: string;
  visit: RecordVisitInput;
}

export function recordVisit({ stopId, visit }: RecordVisitVariables): Promise<StopVisit> {
  return api.post<StopVisit>(`/stops/${encodeURIComponent(stopId)}/visits`, visit);
}

export function useRecordVisit() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: recordVisit,
    // Last visit and next due change on the stop, in every list and in coming due.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: stopsQueryKey }),
    meta: { handlesError: (error) => error.hasFieldErrors },
  });
}

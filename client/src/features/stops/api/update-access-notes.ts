import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { AccessNotesInput, StopDetail } from '../types';
import { isDetailOf, stopQueryKey } from './get-stop';
import { stopsQueryKey } from './get-stops';

export interface UpdateAccessNotesVariables {
  stopId: string;
  notes: AccessNotesInput;
}

export function updateAccessNotes({ stopId, notes }: UpdateAccessNotesVariables): Promise<StopDetail> {
  return api.patch<StopDetail>(`/stops/${encodeURIComponent(stopId)}/access-notes`, notes);
}

export function useUpdateAccessNotes() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateAccessNotes,
    onSuccess: (stop) => {
      queryClient.setQueryData(stopQueryKey(stop.id), stop);
      return queryClient.invalidateQueries({
        queryKey: stopsQueryKey,
        predicate: (query) => !isDetailOf(query.queryKey, stop.id),
      });
    },
    meta: { handlesError: (error) => error.hasFieldErrors },
  });
}

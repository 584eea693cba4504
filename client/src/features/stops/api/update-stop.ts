import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { SavedStop, StopInput } from '../types';
import { detailOfSaved, isDetailOf, stopQueryKey } from './get-stop';
import { stopsQueryKey } from './get-stops';

export interface UpdateStopVariables {
  stopId: string;
  input: Partial<StopInput>;
}

export function updateStop({ stopId, input }: UpdateStopVariables): Promise<SavedStop> {
  return api.patch<SavedStop>(`/stops/${encodeURIComponent(stopId)}`, input);
}

export function useUpdateStop() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateStop,
    onSuccess: (saved) => {
      queryClient.setQueryData(stopQueryKey(saved.id), detailOfSaved(saved));
      return queryClient.invalidateQueries({
        queryKey: stopsQueryKey,
        predicate: (query) => !isDetailOf(query.queryKey, saved.id),
      });
    },
    // The form marks these on its fields (a 400, or a 409 naming the duplicate).
    meta: { handlesError: (error) => error.hasFieldErrors },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { SavedStop, StopInput } from '../types';
import { detailOfSaved, stopQueryKey } from './get-stop';
import { stopsQueryKey } from './get-stops';

export function createStop(input: StopInput): Promise<SavedStop> {
  return api.post<SavedStop>('/stops', input);
}

export function useCreateStop() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createStop,
    onSuccess: async (saved) => {
      await queryClient.invalidateQueries({ queryKey: stopsQueryKey });
      // The page that opens next (the stop, or its form to place the pin) has the stop at once.
      queryClient.setQueryData(stopQueryKey(saved.id), detailOfSaved(saved));
    },
    // The form marks these on its fields (a 400, or a 409 naming the duplicate).
    meta: { handlesError: (error) => error.hasFieldErrors },
  });
}

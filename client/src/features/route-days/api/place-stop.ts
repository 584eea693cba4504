import { useMutation, useQueryClient, type QueryKey } from '@tanstack/react-query';
import { notifications } from '@mantine/notifications';
import { api } from '@/lib/api-client';
import { ApiError } from '@/lib/api-error';
import type { ChangedDays, PlaceStopInput, Week } from '../types';
import { moveStop, replaceDays } from '../week-cache';

export interface PlaceStopVariables extends PlaceStopInput {
  routeDayId: string;
}

export function placeStop({ routeDayId, ...body }: PlaceStopVariables): Promise<ChangedDays> {
  return api.post<ChangedDays>(`/route-days/${encodeURIComponent(routeDayId)}/stops`, body);
}

/** Moves the stop on screen at once, puts the server's recomputed days in when they come, rolls back on a refusal. */
export function usePlaceStop(weekKey: QueryKey) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: placeStop,
    onMutate: async (variables) => {
      await queryClient.cancelQueries({ queryKey: weekKey });
      const before = queryClient.getQueryData<Week>(weekKey);
      if (before) {
        queryClient.setQueryData<Week>(
          weekKey,
          moveStop(before, { stopId: variables.stopId, dayId: variables.routeDayId, position: variables.position }),
        );
      }
      return { before };
    },
    onError: (error, _variables, context) => {
      if (context?.before) queryClient.setQueryData(weekKey, context.before);
      // Someone else changed the day meanwhile: say so and show the day as it is now.
      if (error instanceof ApiError && error.status === 409) {
        notifications.show({ color: 'red', title: 'The day changed meanwhile', message: error.message });
        void queryClient.invalidateQueries({ queryKey: weekKey });
      }
    },
    onSuccess: ({ days }) => {
      queryClient.setQueryData<Week>(weekKey, (week) => (week ? replaceDays(week, days) : week));
      const problems = days.flatMap((day) => day.stops).filter((stop) => stop.problem !== null);
      if (problems.length > 0) {
        notifications.show({
          color: 'brass',
          title: 'Moved, with a problem',
          message: `${problems.map((stop) => stop.name).join(', ')}: see the marked ${problems.length === 1 ? 'stop' : 'stops'}.`,
        });
      }
    },
    meta: { handlesError: (error) => error.status === 409 },
  });
}

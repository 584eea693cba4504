import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PublicStop } from '../types';
import { bookingKeys } from './keys';
import { publicRequest } from './public-request';

export function getPublicStop(stopId: string, signal?: AbortSignal): Promise<PublicStop> {
  return publicRequest(`/public/stops/${encodeURIComponent(stopId)}`, { signal });
}

export function getPublicStopQueryOptions(stopId: string) {
  return queryOptions({
    queryKey: bookingKeys.publicStop(stopId),
    queryFn: ({ signal }) => getPublicStop(stopId, signal),
    enabled: stopId !== '',
    // Open days and the bench time left change as others book; a minute is fresh enough for choosing.
    staleTime: 60_000,
  });
}

export function usePublicStop(stopId: string) {
  return useQuery({
    ...getPublicStopQueryOptions(stopId),
    // A stop from an old link that is gone: the page says so itself.
    meta: { handlesError: (error) => error.status === 404 },
  });
}

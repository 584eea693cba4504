import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PublicBooking } from '../types';
import { bookingKeys } from './keys';
import { publicRequest } from './public-request';

export function getManagedBooking(token: string, signal?: AbortSignal): Promise<PublicBooking> {
  return publicRequest(`/public/bookings/${encodeURIComponent(token)}`, { signal });
}

export function getManagedBookingQueryOptions(token: string) {
  return queryOptions({
    queryKey: bookingKeys.managed(token),
    queryFn: ({ signal }) => getManagedBooking(token, signal),
  });
}

export function useManagedBooking(token: string) {
  return useQuery({
    ...getManagedBookingQueryOptions(token),
    // An unknown or expired link gets its own page, not a red notice.
    meta: { handlesError: (error) => [400, 404, 410].includes(error.status) },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BookingChanges, PublicBooking } from '../types';
import { bookingKeys } from './keys';
import { publicRequest } from './public-request';

export function changeBooking(token: string, changes: BookingChanges): Promise<PublicBooking> {
  return publicRequest(`/public/bookings/${encodeURIComponent(token)}`, { method: 'PATCH', body: changes });
}

export function cancelBooking(token: string): Promise<PublicBooking> {
  return publicRequest(`/public/bookings/${encodeURIComponent(token)}/cancel`, { method: 'POST' });
}

function useSaveManaged(token: string) {
  const queryClient = useQueryClient();
  return (saved: PublicBooking) => {
    queryClient.setQueryData(bookingKeys.managed(token), saved);
    return queryClient.invalidateQueries({ queryKey: bookingKeys.publicStop(saved.stop.id) });
  };
}

export function useChangeBooking(token: string) {
  const onSuccess = useSaveManaged(token);
  return useMutation({
    mutationFn: (changes: BookingChanges) => changeBooking(token, changes),
    onSuccess,
    meta: { handlesError: (error) => error.hasFieldErrors || error.status === 409 },
  });
}

export function useCancelBooking(token: string) {
  const onSuccess = useSaveManaged(token);
  return useMutation({ mutationFn: () => cancelBooking(token), onSuccess });
}

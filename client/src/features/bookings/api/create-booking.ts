import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateBookingInput, CreatedBooking } from '../types';
import { bookingKeys } from './keys';
import { publicRequest } from './public-request';

export function createBooking(input: CreateBookingInput, withSession = false): Promise<CreatedBooking> {
  return publicRequest('/public/bookings', { method: 'POST', body: input, withSession });
}

export function useCreateBooking({ withSession = false }: { withSession?: boolean } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateBookingInput) => createBooking(input, withSession),
    // The bench time left on the stop's days has changed.
    onSuccess: (_created, input) => queryClient.invalidateQueries({ queryKey: bookingKeys.publicStop(input.stopId) }),
    // Field errors and a full or closed day are shown on the form.
    meta: { handlesError: (error) => error.hasFieldErrors || error.status === 409 },
  });
}

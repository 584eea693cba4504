import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { isFieldError } from '@/lib/form-errors';
import type { OpenTicketInput, Ticket, WalkUpInput } from '../types';
import { ticketQueryKey, ticketsQueryKey } from './keys';

export function openTicket(input: OpenTicketInput): Promise<Ticket> {
  return api.post<Ticket>('/tickets', input);
}

/** Someone new at the stop: the server registers them as its customer and opens their walk-up ticket. */
export function openWalkUp(input: WalkUpInput): Promise<Ticket> {
  return api.post<Ticket>('/tickets/walk-up', input);
}

/** A booking becomes a ticket: its registered shears as lines, the rest as "still to add". */
export function checkInBooking(bookingId: string): Promise<Ticket> {
  return api.post<Ticket>(`/bookings/${encodeURIComponent(bookingId)}/check-in`);
}

function remember(queryClient: QueryClient, ticket: Ticket) {
  queryClient.setQueryData(ticketQueryKey(ticket.id), ticket);
  // The stop's ticket list, the day sheet's bookings and the drop-offs lists all change.
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: ticketsQueryKey }),
    queryClient.invalidateQueries({ queryKey: ['route-days'] }),
    queryClient.invalidateQueries({ queryKey: ['bookings'] }),
  ]);
}

export function useOpenTicket() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: openTicket, onSuccess: (ticket) => remember(queryClient, ticket) });
}

export function useOpenWalkUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: openWalkUp,
    onSuccess: (ticket) =>
      Promise.all([remember(queryClient, ticket), queryClient.invalidateQueries({ queryKey: ['customers'] })]),
    // The form shows bad input on its fields.
    meta: { handlesError: (error) => isFieldError(error) },
  });
}

export function useCheckIn() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: checkInBooking, onSuccess: (ticket) => remember(queryClient, ticket) });
}

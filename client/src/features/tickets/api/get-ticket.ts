import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Ticket } from '../types';
import { ticketQueryKey } from './keys';

export function getTicket(id: string, signal?: AbortSignal): Promise<Ticket> {
  return api.get<Ticket>(`/tickets/${encodeURIComponent(id)}`, { signal });
}

export function getTicketQueryOptions(id: string) {
  return queryOptions({
    queryKey: ticketQueryKey(id),
    queryFn: ({ signal }) => getTicket(id, signal),
    // The page says "not found" itself.
    meta: { handlesError: (error) => error.status === 404 },
  });
}

export function useTicket(id: string) {
  return useQuery(getTicketQueryOptions(id));
}

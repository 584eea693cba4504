import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Page } from '@/features/customers/types';
import type { TicketListParams, TicketSummary } from '../types';
import { ticketListQueryKey } from './keys';

export function getTickets(params: TicketListParams, signal?: AbortSignal): Promise<Page<TicketSummary>> {
  return api.get<Page<TicketSummary>>('/tickets', { query: { ...params }, signal });
}

export function getTicketsQueryOptions(params: TicketListParams = {}) {
  return queryOptions({
    queryKey: ticketListQueryKey(params),
    queryFn: ({ signal }) => getTickets(params, signal),
    placeholderData: keepPreviousData,
  });
}

export function useTickets(params: TicketListParams = {}, options: { enabled?: boolean } = {}) {
  return useQuery({ ...getTicketsQueryOptions(params), enabled: options.enabled ?? true });
}

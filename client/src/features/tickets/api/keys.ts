import type { TicketListParams } from '../types';

export const ticketsQueryKey = ['tickets'] as const;

export function ticketListQueryKey(params: TicketListParams) {
  return [...ticketsQueryKey, 'list', params] as const;
}

export function ticketQueryKey(id: string) {
  return [...ticketsQueryKey, 'detail', id] as const;
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export interface CaughtMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  date: string;
  text: string;
  html: string;
}

export interface Outbox {
  items: CaughtMessage[];
  total: number;
}

export function getOutbox(signal?: AbortSignal): Promise<Outbox> {
  return api.get<Outbox>('/dev/outbox', { signal });
}

export function getOutboxQueryOptions() {
  return queryOptions({
    queryKey: ['dev-outbox'],
    queryFn: ({ signal }) => getOutbox(signal),
    staleTime: 0,
    // Newest first, whatever order the catcher keeps.
    select: (outbox) => ({
      ...outbox,
      items: [...outbox.items].sort((a, b) => Date.parse(b.date) - Date.parse(a.date)),
    }),
    // A 404 means the mail catcher is not running; the page says so itself.
    meta: { handlesError: (error) => error.status === 404 },
  });
}

export function useOutbox() {
  return useQuery(getOutboxQueryOptions());
}

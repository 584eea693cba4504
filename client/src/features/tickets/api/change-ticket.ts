import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { AddLineInput, LineChanges, PaymentInput, PhotoStage, Ticket } from '../types';
import { ticketQueryKey, ticketsQueryKey } from './keys';

const ticketPath = (id: string) => `/tickets/${encodeURIComponent(id)}`;
const linePath = (id: string, lineId: string) => `${ticketPath(id)}/lines/${encodeURIComponent(lineId)}`;

/** Every change to a ticket, as the server takes it; each answers the whole ticket as it is now. */
export type TicketChange =
  | { kind: 'add-line'; input: AddLineInput }
  | { kind: 'change-line'; lineId: string; changes: LineChanges }
  | { kind: 'remove-line'; lineId: string }
  | { kind: 'override'; lineId: string; cents: number; reason: string }
  | { kind: 'photo'; lineId: string; stage: PhotoStage; file: File }
  | { kind: 'finish' }
  | { kind: 'hand-back' }
  | { kind: 'payment'; input: PaymentInput }
  | { kind: 'to-invoice' };

export async function changeTicket(id: string, change: TicketChange): Promise<Ticket> {
  switch (change.kind) {
    case 'add-line':
      return api.post<Ticket>(`${ticketPath(id)}/lines`, change.input);
    case 'change-line':
      return api.patch<Ticket>(linePath(id, change.lineId), change.changes);
    case 'remove-line':
      return api.delete<Ticket>(linePath(id, change.lineId));
    case 'override':
      return api.post<Ticket>(`${linePath(id, change.lineId)}/override`, {
        cents: change.cents,
        reason: change.reason,
      });
    case 'photo': {
      const form = new FormData();
      form.append('stage', change.stage);
      form.append('photo', change.file);
      return api.upload<Ticket>(`${linePath(id, change.lineId)}/photos`, form);
    }
    case 'finish':
      return api.post<Ticket>(`${ticketPath(id)}/finish`);
    case 'hand-back':
      return api.post<Ticket>(`${ticketPath(id)}/hand-back`);
    case 'payment':
      return api.post<Ticket>(`${ticketPath(id)}/payments`, change.input);
    case 'to-invoice':
      return api.post<Ticket>(`${ticketPath(id)}/settle`, { settlement: 'to-invoice' });
    default: {
      const unknown: never = change;
      throw new Error(`Unknown ticket change ${JSON.stringify(unknown)}`);
    }
  }
}

export function ticketMutationKey(id: string) {
  return [...ticketsQueryKey, 'change', id] as const;
}

/** One mutation for every change, so the page's "Saved" line follows them all. */
export function useChangeTicket(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: ticketMutationKey(id),
    mutationFn: (change: TicketChange) => changeTicket(id, change),
    onSuccess: (ticket) => {
      queryClient.setQueryData(ticketQueryKey(id), ticket);
      return queryClient.invalidateQueries({ queryKey: [...ticketsQueryKey, 'list'] });
    },
    // The save line on the page shows the server's message with a retry.
    meta: { handlesError: () => true },
  });
}

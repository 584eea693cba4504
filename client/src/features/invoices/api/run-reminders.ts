import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { invoiceKeys } from './keys';

/** The answer of POST /api/invoices/reminders/run (server/src/invoices/reminders). */
export interface ReminderRun {
  /** Reminders made now and waiting to be sent. */
  queued: number;
  sent: number;
  /** Earlier stages passed over because a later one was due as well. */
  skipped: number;
  /** Waiting reminders whose invoice was paid or voided meanwhile. */
  cancelled: number;
  /** Tries the mail relay refused and reminders that cannot go (no address); the server may leave it out. */
  failed?: number;
}

export function runReminders(): Promise<ReminderRun> {
  return api.post<ReminderRun>('/invoices/reminders/run');
}

/** Sends the reminders due today now rather than at the scheduled hour; the server never sends one twice. */
export function useRunReminders() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: runReminders,
    // A sent reminder joins an invoice's send log: all invoice queries go stale, and the list on screen refetches.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invoiceKeys.all }),
  });
}

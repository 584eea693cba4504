import { useCallback, useMemo, useRef, useState } from 'react';
import { useChangeTicket, type TicketChange } from '../api/change-ticket';
import type { Ticket } from '../types';

export type SaveStatus = 'idle' | 'saving' | 'saved' | 'error';

export interface SaveState {
  status: SaveStatus;
  error: Error | null;
}

export type SaveOutcome = { ok: true; ticket: Ticket } | { ok: false; error: Error };

export interface TicketSaver {
  state: SaveState;
  /** Sends one change; `showError: false` when the screen shows the refusal beside its own field. */
  save: (change: TicketChange, options?: { showError?: boolean }) => Promise<SaveOutcome>;
  retry: () => void;
  /** A change is on its way to the server. */
  busy: boolean;
}

/** Tracks every change to one ticket so the page can always say whether it is saved, and retry what failed. */
export function useTicketSaver(ticketId: string): TicketSaver {
  const { mutateAsync } = useChangeTicket(ticketId);
  const [state, setState] = useState<SaveState>({ status: 'idle', error: null });
  const inFlight = useRef(0);
  const failed = useRef<TicketChange | null>(null);

  const save = useCallback(
    async (change: TicketChange, options: { showError?: boolean } = {}): Promise<SaveOutcome> => {
      inFlight.current += 1;
      setState({ status: 'saving', error: null });
      try {
        const ticket = await mutateAsync(change);
        inFlight.current -= 1;
        if (inFlight.current === 0) setState((current) => (current.status === 'error' ? current : saved));
        failed.current = null;
        return { ok: true, ticket };
      } catch (caught) {
        inFlight.current -= 1;
        const error = caught instanceof Error ? caught : new Error(String(caught));
        if (options.showError === false) {
          if (inFlight.current === 0) setState({ status: 'idle', error: null });
        } else {
          failed.current = change;
          setState({ status: 'error', error });
        }
        return { ok: false, error };
      }
    },
    [mutateAsync],
  );

  const retry = useCallback(() => {
    if (failed.current) void save(failed.current);
  }, [save]);

  return useMemo(() => ({ state, save, retry, busy: state.status === 'saving' }), [state, save, retry]);
}

const saved: SaveState = { status: 'saved', error: null };

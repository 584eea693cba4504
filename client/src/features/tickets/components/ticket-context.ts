import type { Role } from '@keenroute/shared';
import { createContext, useContext } from 'react';
import type { TicketSaver } from '../hooks/use-ticket-saver';
import type { Ticket } from '../types';

export interface TicketScreen {
  ticket: Ticket;
  saver: TicketSaver;
  role: Role;
  currency: string;
  /** Lines may still change: the ticket is open. */
  editable: boolean;
}

export const TicketScreenContext = createContext<TicketScreen | null>(null);

export function useTicketScreen(): TicketScreen {
  const screen = useContext(TicketScreenContext);
  if (!screen) throw new Error('useTicketScreen is used outside the ticket page');
  return screen;
}

import { createContext, useContext } from 'react';
import type { RouteDay, RouteDayStop, Week } from '../types';

export interface BoardActions {
  week: Week;
  /** May drag and move stops (owner and office anyone's, a sharpener their own days). */
  canMove: boolean;
  /** Owner and office: take a stop off and place stops from the unplanned list. */
  canManage: boolean;
  toggleLock: (day: RouteDay, stop: RouteDayStop) => void;
  /** Opens the Move to… dialog for a stop on a day or on the unplanned list. */
  askMove: (stopId: string) => void;
  takeOff: (day: RouteDay, stop: RouteDayStop) => void;
  /** The stop whose move the server is still working out. */
  placingStopId: string | null;
  lockingStopId: string | null;
  /** A finger, not a mouse: buttons grow to 44 px. */
  touch: boolean;
}

export const BoardContext = createContext<BoardActions | null>(null);

export function useBoard(): BoardActions {
  const board = useContext(BoardContext);
  if (!board) throw new Error('useBoard is used outside the week board');
  return board;
}

import { useMediaQuery } from '@mantine/hooks';
import { notifications } from '@mantine/notifications';
import { useState } from 'react';
import { useStopLock } from '../api/lock-stop';
import { usePlaceStop } from '../api/place-stop';
import { useRemoveStop } from '../api/remove-stop';
import { weekQueryKey } from '../api/keys';
import type { RouteDay, RouteDayStop, Week } from '../types';
import type { StopMove } from '../week-cache';
import type { BoardActions } from './board-context';

/** What the board's buttons, menus and drops do, wired to the week's cache. */
export function useWeekActions(week: Week | undefined, monday: string, canMove: boolean, canManage: boolean) {
  const weekKey = weekQueryKey(monday);
  const place = usePlaceStop(weekKey);
  const lock = useStopLock(weekKey);
  const remove = useRemoveStop();
  const [moving, setMoving] = useState<string | null>(null);
  const touch = useMediaQuery('(pointer: coarse)', false, { getInitialValueInEffect: false });

  const move = (change: StopMove) => {
    const day = week?.days.find((candidate) => candidate.id === change.dayId);
    place.mutate({ routeDayId: change.dayId, stopId: change.stopId, position: change.position, version: day?.version });
  };

  const toggleLock = (day: RouteDay, stop: RouteDayStop) =>
    lock.mutate({ routeDayId: day.id, stopId: stop.stopId, locked: !stop.locked });

  const takeOff = (day: RouteDay, stop: RouteDayStop) =>
    remove.mutate(
      { routeDayId: day.id, stopId: stop.stopId, monday },
      {
        onSuccess: () =>
          notifications.show({ color: 'keenTeal', title: 'Taken off the day', message: `${stop.name} is unplanned.` }),
      },
    );

  const board: BoardActions | null = week
    ? {
        week,
        canMove,
        canManage,
        toggleLock,
        askMove: setMoving,
        takeOff,
        placingStopId: place.isPending ? place.variables.stopId : null,
        lockingStopId: lock.isPending ? lock.variables.stopId : null,
        touch,
      }
    : null;

  return { board, move, moving, closeMove: () => setMoving(null) };
}

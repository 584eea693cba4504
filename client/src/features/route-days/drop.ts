import type { Week } from './types';
import { whereIs, type StopMove } from './week-cache';

// Drag ids: a stop on a day, a stop on the unplanned list, and a day's list itself (to drop on an empty day).
export const stopDragId = (stopId: string) => `stop:${stopId}`;
export const unplannedDragId = (stopId: string) => `unplanned:${stopId}`;
export const dayDropId = (dayId: string) => `day:${dayId}`;

function parse(id: string): { kind: 'stop' | 'unplanned' | 'day'; key: string } | null {
  const match = /^(stop|unplanned|day):(.+)$/.exec(id);
  return match ? { kind: match[1] as 'stop' | 'unplanned' | 'day', key: match[2] as string } : null;
}

/** The stop id a drag id carries, for announcements. */
export function stopIdOf(dragId: string): string | null {
  const parsed = parse(dragId);
  return parsed && parsed.kind !== 'day' ? parsed.key : null;
}

/**
 * Where a drop puts the dragged stop: on another stop, it takes that stop's place (the others make room); on a day's
 * list, it goes last. Null when nothing would change.
 */
export function resolveDrop(week: Week, activeId: string, overId: string | null): StopMove | null {
  const active = parse(activeId);
  const over = overId ? parse(overId) : null;
  if (!active || active.kind === 'day' || !over || over.kind === 'unplanned') return null;
  const from = whereIs(week, active.key);

  let dayId: string;
  let position: number;
  if (over.kind === 'stop') {
    const target = whereIs(week, over.key);
    if (!target) return null;
    dayId = target.day.id;
    position = target.index;
  } else {
    const day = week.days.find((candidate) => candidate.id === over.key);
    if (!day) return null;
    dayId = day.id;
    position = from?.day.id === day.id ? day.stops.length - 1 : day.stops.length;
  }
  if (from && from.day.id === dayId && from.index === position) return null;
  return { stopId: active.key, dayId, position };
}

import { STOP_KIND_LABELS, WEEKDAY_LABELS, type StopKind, type Weekday } from '@keenroute/shared';
import { formatDay, formatShortDay, upperFirst } from '@/lib/format';

// The stop screens import their day formats from here with the rest of their wording.
export { formatDay, formatShortDay };
import type { StopSummary } from './types';

/** Today as a calendar date on this device. */
export function todayIso(now: Date = new Date()): string {
  const month = String(now.getMonth() + 1).padStart(2, '0');
  const day = String(now.getDate()).padStart(2, '0');
  return `${now.getFullYear()}-${month}-${day}`;
}

export function kindLabel(kind: StopKind): string {
  return upperFirst(STOP_KIND_LABELS[kind]);
}

export function shortWeekday(day: Weekday): string {
  return WEEKDAY_LABELS[day].slice(0, 3);
}

export function formatAddress(stop: Pick<StopSummary, 'street' | 'city' | 'region' | 'postalCode'>): string {
  const place = [stop.region, stop.postalCode].filter(Boolean).join(' ');
  return [stop.street, stop.city, place].filter(Boolean).join(', ');
}

/** "12 days overdue", "due today", "due in 3 days". */
export function dueWording(daysOverdue: number): string {
  if (daysOverdue > 0) return `${daysOverdue} ${daysOverdue === 1 ? 'day' : 'days'} overdue`;
  if (daysOverdue === 0) return 'due today';
  const left = -daysOverdue;
  return `due in ${left} ${left === 1 ? 'day' : 'days'}`;
}

export type DueLevel = 'overdue' | 'soon' | 'later';

/** Overdue after the due day; "soon" within a week of it, so the week ahead can be planned. */
export function dueLevel(daysOverdue: number): DueLevel {
  if (daysOverdue > 0) return 'overdue';
  return daysOverdue >= -7 ? 'soon' : 'later';
}

export function cadenceWording(weeks: number): string {
  return weeks === 1 ? 'every week' : `every ${weeks} weeks`;
}

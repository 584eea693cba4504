import { formatTimeOfDay, MINUTES_PER_DAY, WEEKDAY_LABELS } from '@keenroute/shared';
import { formatShortDay } from '@/lib/format';
import type { RouteDay, StopProblem, UnplannedReason } from './types';

/** "09:05" for a time of day in minutes, or a dash when the day has none. */
export function timeOfDay(minutes: number | null): string {
  return minutes === null ? '–' : formatTimeOfDay(Math.min(Math.max(Math.round(minutes), 0), MINUTES_PER_DAY - 1));
}

/** "09:00–10:00". */
export function timeRange(from: number, to: number): string {
  return `${timeOfDay(from)}–${timeOfDay(to)}`;
}

/** "45 min", "1 h", "2 h 05 min". */
export function duration(minutes: number): string {
  const whole = Math.max(0, Math.round(minutes));
  const hours = Math.floor(whole / 60);
  const rest = whole % 60;
  if (hours === 0) return `${rest} min`;
  return rest === 0 ? `${hours} h` : `${hours} h ${String(rest).padStart(2, '0')} min`;
}

/** "12.3 km", to one decimal under 100 km, whole above. */
export function distance(km: number): string {
  return km < 100 ? `${(Math.round(km * 10) / 10).toFixed(1)} km` : `${Math.round(km)} km`;
}

/** "Tuesday, Mar 4". */
export function dayTitle(day: Pick<RouteDay, 'day' | 'weekday'>): string {
  return `${WEEKDAY_LABELS[day.weekday]}, ${formatShortDay(day.day)}`;
}

export function stopsWording(count: number): string {
  return `${count} ${count === 1 ? 'stop' : 'stops'}`;
}

const PROBLEMS: Record<StopProblem, string> = {
  'after-closing': 'Arrives after closing',
  'closed-that-day': 'Closed that day',
  'day-too-long': 'Day runs past the latest finish',
};

export function problemWording(problem: StopProblem): string {
  return PROBLEMS[problem];
}

const REASONS: Record<UnplannedReason, string> = {
  'window-closed': 'No opening fits',
  'day-too-long': 'Days too long',
  capacity: 'Week is full',
  'lock-impossible': 'Lock cannot hold',
  'no-coordinates': 'No map pin',
  'closed-all-week': 'Closed all week',
  'taken-off': 'Taken off by hand',
};

/** A short label for the badge; the server's reasonText says the whole sentence. */
export function reasonLabel(reason: UnplannedReason): string {
  return REASONS[reason];
}

/** "08:30" → 510; anything not a 24-hour HH:MM answers null. */
export function parseTimeOfDay(text: string): number | null {
  const match = /^([01]\d|2[0-3]):([0-5]\d)$/.exec(text.trim());
  return match ? Number(match[1]) * 60 + Number(match[2]) : null;
}

import { EDGE_TYPE_LABELS, TOOL_KIND_LABELS, formatTimeOfDay } from '@keenroute/shared';
import type { BookingItem, BookingStatus, Cutoff, TimeWindow } from './types';

const weekdayFormat = new Intl.DateTimeFormat('en', {
  weekday: 'long',
  day: 'numeric',
  month: 'short',
  timeZone: 'UTC',
});

// A "YYYY-MM-DD" is a calendar day: read and shown in UTC so no time zone moves it a day.
/** "Tuesday, Mar 3" for a calendar day; anything else is shown as given. */
export function formatBookingDay(isoDate: string): string {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(isoDate);
  if (!match) return isoDate;
  return weekdayFormat.format(new Date(Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3]))));
}

/** "09:00–10:00": the expected arrival window of the sharpener. */
export function formatWindow(window: TimeWindow): string {
  return `${formatTimeOfDay(window.from)}–${formatTimeOfDay(window.to)}`;
}

/** "18:00 on Monday, Mar 2": when changes close. */
export function formatCutoff(cutoff: Cutoff): string {
  return `${formatTimeOfDay(cutoff.minute)} on ${formatBookingDay(cutoff.date)}`;
}

export function pairsIn(items: readonly BookingItem[]): number {
  return items.reduce((sum, item) => sum + item.count, 0);
}

/** "2 × convex straight shear" for one row of a booking. */
export function describeItem(item: BookingItem): string {
  return `${item.count} × ${EDGE_TYPE_LABELS[item.edgeType]} ${TOOL_KIND_LABELS[item.toolKind]}`;
}

/** "3 pairs: 2 × convex straight shear, 1 × beveled thinning shear". */
export function summarizeItems(items: readonly BookingItem[]): string {
  if (items.length === 0) return 'No shears listed';
  const pairs = pairsIn(items);
  return `${pairs} ${pairs === 1 ? 'pair' : 'pairs'}: ${items.map(describeItem).join(', ')}`;
}

export const STATUS_LABELS: Record<BookingStatus, string> = {
  booked: 'Booked',
  'checked-in': 'Checked in',
  cancelled: 'Cancelled',
};

export const STATUS_COLORS: Record<BookingStatus, string> = {
  booked: 'keenTeal',
  'checked-in': 'brass',
  cancelled: 'gray',
};

/** "45 min" or "1 h 30 min" of bench time. */
export function formatMinutes(minutes: number): string {
  if (minutes < 60) return `${minutes} min`;
  const hours = Math.floor(minutes / 60);
  const rest = minutes % 60;
  return rest === 0 ? `${hours} h` : `${hours} h ${rest} min`;
}

import { DEFAULT_BENCH_MINUTES, benchMinutes } from '../bench-time.js';
import { RuleError } from '../errors.js';
import { TICKET_LINES_MAX } from '../limits.js';
import type { EdgeType, ToolKind } from '../shears.js';

/** Most pairs of one kind on one booking line. */
export const BOOKING_ITEM_COUNT_MAX = 50;
/** Most pairs on one booking: it becomes one ticket, which holds at most this many shears. */
export const BOOKING_PAIRS_MAX = TICKET_LINES_MAX;

/** Shears of one kind a customer books for a drop-off. */
export interface BookingItem {
  edgeType: EdgeType;
  toolKind: ToolKind;
  count: number;
}

/** The route day's figures that bound how much bench work can be booked on it (minutes after midnight). */
export interface BookableDay {
  shiftStart: number;
  latestFinish: number;
  lunchMinutes: number;
  driveMinutes: number;
  stopCount: number;
  /** Unpacking at each stop; the bench-time default when left out. */
  setupPerStop?: number;
}

/** Bench minutes a booking takes: its pairs only, since the stop's setup is counted once for the day. */
export function bookedBenchMinutes(items: readonly BookingItem[]): number {
  items.forEach((item, index) => {
    if (!Number.isInteger(item.count) || item.count < 1 || item.count > BOOKING_ITEM_COUNT_MAX) {
      throw new RuleError(
        'invalid-count',
        `Book 1 to ${BOOKING_ITEM_COUNT_MAX} pairs of one kind; got ${item.count}.`,
        `items[${index}].count`,
      );
    }
  });
  const pairs = items.reduce((sum, item) => sum + item.count, 0);
  if (pairs > BOOKING_PAIRS_MAX) {
    throw new RuleError(
      'invalid-count',
      `One drop-off holds at most ${BOOKING_PAIRS_MAX} pairs; got ${pairs}.`,
      'items',
    );
  }
  return benchMinutes(items, { includeSetup: false });
}

/**
 * The bench minutes a route day can take in bookings: the working day less the break, the driving and each stop's
 * setup. The planner's expected turnout does not count against it, so walk-ups fill whatever bookings leave.
 */
export function bookableMinutes(day: BookableDay): number {
  const setup = day.setupPerStop ?? DEFAULT_BENCH_MINUTES.setupPerStop;
  const minutes = day.latestFinish - day.shiftStart - day.lunchMinutes - day.driveMinutes - setup * day.stopCount;
  return Math.max(0, minutes);
}

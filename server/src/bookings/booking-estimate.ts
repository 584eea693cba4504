import {
  EDGE_TYPE_LABELS,
  TOOL_KIND_LABELS,
  bookedBenchMinutes,
  priceTicket,
  type BookingItem,
  type RateCard,
  type TicketLine,
} from '@keenroute/shared';
import type { BookingQuoteDto } from './dto/booking-response.dto';

/** The estimate's assumption: a pair is a 6.5 in right-handed shear (common practice for a typical hair shear). */
export const ESTIMATE_LENGTH_IN = 6.5;
export const ESTIMATE_NOTE =
  'An estimate: each pair is priced as a 6.5 in right-handed shear with no add-on services. The sharpener sets the price at the bench.';

/** Prices a booking's pairs with the rules package over the rate card in force, at the stop's tax rate. */
export function estimateBooking(items: readonly BookingItem[], card: RateCard, taxRateBp: number): BookingQuoteDto {
  const ticketLines: TicketLine[] = items.flatMap((item) =>
    Array.from({ length: item.count }, () => ({
      shear: { edgeType: item.edgeType, toolKind: item.toolKind, lengthIn: ESTIMATE_LENGTH_IN, handedness: 'right' },
    })),
  );
  // A drop-off carries no trip charge: that belongs to the stop visit's own ticket.
  const price = priceTicket(ticketLines, card, { taxRateBp, chargeTrip: false });
  const lines: BookingQuoteDto['lines'] = [];
  let at = 0;
  for (const item of items) {
    const cents = price.lines.slice(at, at + item.count).reduce((sum, line) => sum + line.totalCents, 0);
    at += item.count;
    const what = `${EDGE_TYPE_LABELS[item.edgeType]} ${TOOL_KIND_LABELS[item.toolKind]}`;
    lines.push({ label: `${item.count} × ${what} (estimate)`, cents });
  }
  if (price.discount) lines.push({ label: price.discount.explanation, cents: -price.discount.cents });
  if (price.minimumTopUpCents > 0) lines.push({ label: 'ticket minimum', cents: price.minimumTopUpCents });
  if (price.taxCents > 0) lines.push({ label: price.summary.at(-1)!, cents: price.taxCents });
  return {
    estimateCents: price.totalCents,
    currency: price.currency,
    benchMinutes: bookedBenchMinutes(items),
    lines,
    taxNote: price.taxNote,
    note: ESTIMATE_NOTE,
  };
}

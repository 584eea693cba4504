import { EDGE_TYPE_LABELS, TOOL_KIND_LABELS, formatMoney, formatTimeOfDay } from '@keenroute/shared';
import type { OutgoingMail } from '../mail/mail.service';
import { longDayLabel } from '../route-days/notices/visit-notice-mail';
import type { PublicBookingDto } from './dto/booking-response.dto';

const SIGNATURE = 'Keenroute (demo business: the people and places in this demo are invented)';

/** The private link that reads, changes and cancels a booking. */
export function manageUrl(appUrl: string, token: string): string {
  return `${appUrl.replace(/\/+$/, '')}/drop-off/${token}`;
}

/** The confirmation a customer gets when a drop-off is booked; the address is an object, so no name reaches a header raw. */
export function bookingConfirmationMail(booking: PublicBookingDto, link: string, currency: string): OutgoingMail {
  const when = booking.mailIn
    ? 'Mail-in: post your shears to the address on the booking page; we will let you know when they arrive.'
    : [
        `Drop-off at ${booking.stop.name}, ${booking.stop.city} for the visit on ${longDayLabel(booking.day!)}.`,
        booking.arrivalWindow
          ? `Expected arrival: between ${formatTimeOfDay(booking.arrivalWindow.from)} and ${formatTimeOfDay(booking.arrivalWindow.to)} (an estimate).`
          : '',
      ]
        .filter(Boolean)
        .join('\n');
  const items = booking.items.map(
    (item) => `- ${item.count} × ${EDGE_TYPE_LABELS[item.edgeType]} ${TOOL_KIND_LABELS[item.toolKind]}`,
  );
  const estimate =
    booking.estimateCents === null
      ? 'The price is set at the bench.'
      : `Estimated price: ${formatMoney(booking.estimateCents, currency)} (an estimate; the sharpener sets the price at the bench).`;
  const cutoff = booking.cutoff
    ? `You can change or cancel until ${formatTimeOfDay(booking.cutoff.minute)} on ${longDayLabel(booking.cutoff.date)}:`
    : 'You can change or cancel until your shears arrive:';
  const text = [
    `Hello ${booking.name},`,
    '',
    'Your drop-off is booked.',
    when,
    '',
    'Shears:',
    ...items,
    estimate,
    '',
    cutoff,
    link,
    '',
    'Keep this link private: anyone with it can change your booking.',
    '',
    '-- ',
    SIGNATURE,
  ].join('\n');
  return {
    to: { name: booking.name, address: booking.email },
    subject: booking.mailIn
      ? 'Your mail-in drop-off is booked'
      : `Your drop-off at ${booking.stop.name} on ${longDayLabel(booking.day!)}`,
    text,
  };
}

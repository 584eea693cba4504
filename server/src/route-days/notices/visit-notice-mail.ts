import { arrivalWindow, formatTimeOfDay } from '@keenroute/shared';
import type { OutgoingMail } from '../../mail/mail.service';

export interface VisitNoticeContent {
  to: string;
  /** Who the greeting names: the customer, or the stop itself when the notice goes to the stop's own address. */
  greetingName: string;
  stopName: string;
  /** "YYYY-MM-DD". */
  day: string;
  /** Planned arrival, minutes after midnight in the business's time zone. */
  arrival: number;
  bookingUrl: string;
}

const SIGNATURE = 'Keenroute (demo business: the people and places in this demo are invented)';

/** A calendar date read as a date, not an instant: formatted in UTC so no time zone moves it across midnight. */
function dayParts(day: string, options: Intl.DateTimeFormatOptions): Record<string, string> {
  const [year, month, date] = day.split('-').map(Number) as [number, number, number];
  const parts = new Intl.DateTimeFormat('en-GB', { ...options, timeZone: 'UTC' }).formatToParts(
    new Date(Date.UTC(year, month - 1, date)),
  );
  return Object.fromEntries(parts.map((part) => [part.type, part.value]));
}

/** "Tue 8 Dec". */
export function shortDayLabel(day: string): string {
  const p = dayParts(day, { weekday: 'short', day: 'numeric', month: 'short' });
  return `${p.weekday} ${p.day} ${p.month}`;
}

/** "Tuesday 8 December 2026". */
export function longDayLabel(day: string): string {
  const p = dayParts(day, { weekday: 'long', day: 'numeric', month: 'long', year: 'numeric' });
  return `${p.weekday} ${p.day} ${p.month} ${p.year}`;
}

/** Where a groomer books shears for this stop's visit on this day. */
export function bookingUrl(appUrl: string, stopId: string, day: string): string {
  const url = new URL('/book', appUrl.replace(/\/+$/, '') + '/');
  url.searchParams.set('stop', stopId);
  url.searchParams.set('day', day);
  return url.toString();
}

const escapeHtml = (text: string) =>
  text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

/** The notice a stop and its consenting customers get a few days before a route day. */
export function visitNoticeMail(content: VisitNoticeContent): OutgoingMail {
  const window = arrivalWindow(content.arrival);
  const from = formatTimeOfDay(window.from);
  const to = formatTimeOfDay(window.to);
  const longDay = longDayLabel(content.day);
  const estimate =
    'The time is an estimate: traffic and the stops before yours can move it. The window is one hour from the quarter hour before the planned arrival.';
  const text = [
    `Hello ${content.greetingName},`,
    '',
    `Your sharpener visits ${content.stopName} on ${longDay}.`,
    `Expected arrival: between ${from} and ${to}.`,
    estimate,
    '',
    `Book your shears for this visit:`,
    content.bookingUrl,
    '',
    '-- ',
    SIGNATURE,
  ].join('\n');
  const html = [
    `<p>Hello ${escapeHtml(content.greetingName)},</p>`,
    `<p>Your sharpener visits <strong>${escapeHtml(content.stopName)}</strong> on <strong>${escapeHtml(longDay)}</strong>.<br>`,
    `Expected arrival: between <strong>${from}</strong> and <strong>${to}</strong>.</p>`,
    `<p><small>${escapeHtml(estimate)}</small></p>`,
    `<p><a href="${escapeHtml(content.bookingUrl)}">Book your shears for this visit</a></p>`,
    `<p style="color:#666">${escapeHtml(SIGNATURE)}</p>`,
  ].join('\n');
  return {
    to: content.to,
    subject: `Keenroute visit on ${shortDayLabel(content.day)}: expected ${from}–${to}`,
    text,
    html,
  };
}

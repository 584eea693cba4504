const dateFormat = new Intl.DateTimeFormat('en', { day: 'numeric', month: 'short', year: 'numeric' });
const dateTimeFormat = new Intl.DateTimeFormat('en', {
  day: 'numeric',
  month: 'short',
  year: 'numeric',
  hour: '2-digit',
  minute: '2-digit',
});

/** An instant (a timestamp) as a date in the reader's zone; a calendar date "YYYY-MM-DD" needs a day formatter instead. */
export function formatDate(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? '' : dateFormat.format(date);
}

export function formatDateTime(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? '' : dateTimeFormat.format(date);
}

/** "convex straight shear" → "Convex straight shear", for the start of a heading or cell. */
export function upperFirst(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

const dayFormat = new Intl.DateTimeFormat('en', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
const shortDayFormat = new Intl.DateTimeFormat('en', { day: 'numeric', month: 'short', timeZone: 'UTC' });

function calendarDay(isoDate: string): Date | null {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(isoDate);
  return match ? new Date(Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3]))) : null;
}

// A "YYYY-MM-DD" is a calendar day, not an instant: read and shown in UTC so no time zone moves it a day.
/** "Mar 3, 2025" for a calendar day; anything else is shown as given. */
export function formatDay(isoDate: string): string {
  const date = calendarDay(isoDate);
  return date ? dayFormat.format(date) : isoDate;
}

/** "Mar 3" for a calendar day. */
export function formatShortDay(isoDate: string): string {
  const date = calendarDay(isoDate);
  return date ? shortDayFormat.format(date) : isoDate;
}

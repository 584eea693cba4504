/** One formatter per time zone: building an Intl.DateTimeFormat costs far more than formatting with it. */
const dayFormats = new Map<string, Intl.DateTimeFormat>();

function dayFormat(timeZone: string): Intl.DateTimeFormat {
  let format = dayFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat('en-US', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' });
    dayFormats.set(timeZone, format);
  }
  return format;
}

/** Today's calendar date "YYYY-MM-DD" in the business's time zone: what coming-due dates and history days count from. */
export function todayIn(timeZone: string, now: Date = new Date()): string {
  const parts = dayFormat(timeZone).formatToParts(now);
  const part = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value ?? '';
  return `${part('year')}-${part('month')}-${part('day')}`;
}

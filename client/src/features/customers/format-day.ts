const dayFormat = new Intl.DateTimeFormat('en', { day: 'numeric', month: 'short', year: 'numeric' });

/** "10 Feb 2025" for a "YYYY-MM-DD" day; read as a local date, so no time zone moves it a day. */
export function formatDay(day: string): string {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(day);
  if (!match) return day;
  return dayFormat.format(new Date(Number(match[1]), Number(match[2]) - 1, Number(match[3])));
}

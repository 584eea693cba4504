/** Today's calendar date in a time zone, "YYYY-MM-DD" (en-CA formats dates that way). */
export function todayIn(timeZone: string, now = new Date()): string {
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(now);
}

/**
 * Instants of the business's working day: "2025-03-14" at 9:40 in America/Chicago as a Date. The offset is read once
 * per day at noon (route days run 8:00 to 18:00, clear of the 2:00 daylight-saving switch), which keeps a history of
 * 600,000 timestamps from formatting dates 600,000 times.
 */
export class BusinessClock {
  private readonly offsets = new Map<string, number>();
  private readonly format: Intl.DateTimeFormat;

  constructor(readonly timeZone: string) {
    this.format = new Intl.DateTimeFormat('en-US', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
    });
  }

  /** The instant of `minutes` after midnight on `day`, business time. */
  at(day: string, minutes: number): Date {
    return new Date(utcMidnight(day) + minutes * 60_000 - this.offsetMs(day));
  }

  /** Local time minus UTC on that day, in milliseconds (negative west of Greenwich). */
  private offsetMs(day: string): number {
    let offset = this.offsets.get(day);
    if (offset === undefined) {
      const noon = utcMidnight(day) + 12 * 3_600_000;
      const part = (type: Intl.DateTimeFormatPartTypes) =>
        Number(this.format.formatToParts(noon).find((p) => p.type === type)?.value);
      const local = Date.UTC(part('year'), part('month') - 1, part('day'), part('hour'), part('minute'));
      offset = local - noon;
      this.offsets.set(day, offset);
    }
    return offset;
  }
}

const utcMidnight = (day: string) => Date.parse(`${day}T00:00:00Z`);

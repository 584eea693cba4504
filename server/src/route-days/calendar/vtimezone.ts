const DAY_MS = 24 * 60 * 60 * 1000;
const MINUTE_MS = 60 * 1000;

const formats = new Map<string, Intl.DateTimeFormat>();

/** The zone's offset from UTC in minutes at an instant (east positive), from the runtime's IANA database. */
export function utcOffsetMinutes(timeZone: string, instant: number): number {
  let format = formats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat('en-US', { timeZone, timeZoneName: 'longOffset' });
    formats.set(timeZone, format);
  }
  const name = format.formatToParts(instant).find((part) => part.type === 'timeZoneName')?.value ?? 'GMT';
  const match = /^GMT([+-])(\d{2}):(\d{2})$/.exec(name);
  if (!match) return 0;
  const minutes = Number(match[2]) * 60 + Number(match[3]);
  return match[1] === '-' ? -minutes : minutes;
}

/** The instant a wall-clock time in the zone names: "YYYY-MM-DD" plus minutes after midnight. */
export function zonedInstant(timeZone: string, day: string, minute: number): Date {
  const [year, month, date] = day.split('-').map(Number) as [number, number, number];
  const wall = Date.UTC(year, month - 1, date, 0, minute);
  let instant = wall - utcOffsetMinutes(timeZone, wall) * MINUTE_MS;
  // Once more with the offset at the first guess: right on both sides of a change of offset.
  instant = wall - utcOffsetMinutes(timeZone, instant) * MINUTE_MS;
  return new Date(instant);
}

interface Observance {
  /** Local time at the onset, in the offset before it. */
  onset: string;
  from: number;
  to: number;
}

const stamp = (ms: number) => new Date(ms).toISOString().slice(0, 19).replace(/[-:]/g, '');

const formatOffset = (minutes: number) => {
  const abs = Math.abs(minutes);
  return `${minutes < 0 ? '-' : '+'}${String(Math.floor(abs / 60)).padStart(2, '0')}${String(abs % 60).padStart(2, '0')}`;
};

/** The first instant in (after, before] with the offset of `before`, to the minute. */
function changeBetween(timeZone: string, after: number, before: number): number {
  const target = utcOffsetMinutes(timeZone, before);
  let low = after;
  let high = before;
  while (high - low > MINUTE_MS) {
    const middle = low + Math.floor((high - low) / 2 / MINUTE_MS) * MINUTE_MS;
    if (utcOffsetMinutes(timeZone, middle) === target) high = middle;
    else low = middle;
  }
  return high;
}

/**
 * An RFC 5545 VTIMEZONE (section 3.6.5) for the zone, with one observance per change of offset between `from` and
 * `to`: every TZID an iCalendar object uses must have one. Each observance is a single onset (no RRULE), read from
 * the runtime's time zone data, so the feed carries the same rules the server used to plan.
 */
export function vtimezone(timeZone: string, from: Date, to: Date): string {
  const start = from.getTime();
  const end = to.getTime();
  const initial = utcOffsetMinutes(timeZone, start);
  const observances: Observance[] = [{ onset: '19700101T000000', from: initial, to: initial }];
  let previous = start;
  let offset = initial;
  for (let probe = start + DAY_MS; previous < end; probe += DAY_MS) {
    const at = Math.min(probe, end);
    const next = utcOffsetMinutes(timeZone, at);
    if (next !== offset) {
      const change = changeBetween(timeZone, previous, at);
      observances.push({ onset: stamp(change + offset * MINUTE_MS), from: offset, to: next });
      offset = next;
    }
    previous = at;
  }
  const standard = Math.min(...observances.map((o) => o.to));
  const lines = ['BEGIN:VTIMEZONE', `TZID:${timeZone}`];
  for (const o of observances) {
    const kind = o.to > standard ? 'DAYLIGHT' : 'STANDARD';
    lines.push(
      `BEGIN:${kind}`,
      `DTSTART:${o.onset}`,
      `TZOFFSETFROM:${formatOffset(o.from)}`,
      `TZOFFSETTO:${formatOffset(o.to)}`,
      `END:${kind}`,
    );
  }
  lines.push('END:VTIMEZONE');
  return lines.join('\r\n');
}

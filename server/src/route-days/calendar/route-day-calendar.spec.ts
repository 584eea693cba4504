import ical, { type VEvent } from 'node-ical';
import { execFileSync } from 'node:child_process';
import { dayEventUid, routeDayCalendar, stopEventUid, type CalendarRouteDay } from './route-day-calendar';
import { vtimezone, zonedInstant } from './vtimezone';

const TZ = 'America/Chicago';

/** Two days either side of the US spring change (second Sunday of March 2026 = 8 March). */
const days: CalendarRouteDay[] = [
  {
    id: '0b7c8f7e-1111-4c1e-9a55-000000000001',
    day: '2026-03-06',
    departure: 8 * 60,
    finish: 16 * 60 + 40,
    distanceKm: 83.6,
    version: 3,
    stops: [
      {
        stopId: '5a0e5f9b-2222-4d0a-8a11-000000000001',
        name: 'Salon Quill, demo',
        street: '12 Birch Row',
        city: 'Larkhaven',
        arrival: 9 * 60 + 7,
        leave: 10 * 60 + 20,
        accessParking: 'Back lot',
        accessDoor: 'Ring twice',
        accessBestTime: '',
      },
    ],
  },
  {
    id: '0b7c8f7e-1111-4c1e-9a55-000000000002',
    day: '2026-03-09',
    departure: 7 * 60 + 45,
    finish: 15 * 60,
    distanceKm: 41.2,
    version: 1,
    stops: [
      {
        stopId: '5a0e5f9b-2222-4d0a-8a11-000000000002',
        name: 'Groomer; "Comma, Inc."',
        street: '4 Elm Court',
        city: 'Fenmoor',
        arrival: 23 * 60,
        leave: 23 * 60 + 59,
        accessParking: '',
        accessDoor: '',
        accessBestTime: 'Mornings',
      },
    ],
  },
];

const input = {
  sharpenerName: 'Robin Demo',
  timeZone: TZ,
  from: new Date('2026-03-01T00:00:00Z'),
  to: new Date('2026-03-20T00:00:00Z'),
  days,
};
const build = () => routeDayCalendar(input);

/** Jest keeps process.env to itself, so the feed is built in a child process started in the server zone asked for. */
function buildWithServerIn(serverZone: string): string {
  const script = `
    const { routeDayCalendar } = require(${JSON.stringify(require.resolve('./route-day-calendar'))});
    const input = JSON.parse(process.argv[1]);
    process.stdout.write(routeDayCalendar({ ...input, from: new Date(input.from), to: new Date(input.to) }));`;
  return execFileSync(
    process.execPath,
    ['-r', 'ts-node/register/transpile-only', '-e', script, JSON.stringify(input)],
    {
      env: { ...process.env, TZ: serverZone },
      encoding: 'utf8',
    },
  );
}

const events = (text: string) =>
  Object.values(ical.sync.parseICS(text)).filter((c): c is VEvent => (c as VEvent | undefined)?.type === 'VEVENT');

describe('routeDayCalendar', () => {
  // The server's own zone must not move the events: each run builds the feed in a different process zone.
  it.each(['UTC', 'Asia/Kolkata', 'Pacific/Auckland'])(
    'puts every event at the planned minutes in the business time zone (RFC 5545 3.3.5 form 3) with the server in %s',
    (serverZone) => {
      const parsed = events(buildWithServerIn(serverZone));
      expect(parsed).toHaveLength(4);
      for (const day of days) {
        const dayEvent = parsed.find((e) => e.uid === dayEventUid(day.id))!;
        expect(dayEvent.start.toISOString()).toBe(zonedInstant(TZ, day.day, day.departure!).toISOString());
        expect(dayEvent.end!.toISOString()).toBe(zonedInstant(TZ, day.day, day.finish!).toISOString());
        expect(dayEvent.start.tz).toBe(TZ);
        for (const stop of day.stops) {
          const event = parsed.find((e) => e.uid === stopEventUid(day.id, stop.stopId))!;
          expect(event.start.toISOString()).toBe(zonedInstant(TZ, day.day, stop.arrival).toISOString());
          expect(event.end!.toISOString()).toBe(zonedInstant(TZ, day.day, stop.leave).toISOString());
        }
      }
    },
  );

  it('keeps the wall-clock time across the change of offset: 09:07 is 15:07Z before, 14:07Z after', () => {
    expect(zonedInstant(TZ, '2026-03-06', 9 * 60 + 7).toISOString()).toBe('2026-03-06T15:07:00.000Z');
    expect(zonedInstant(TZ, '2026-03-09', 9 * 60 + 7).toISOString()).toBe('2026-03-09T14:07:00.000Z');
  });

  it('writes summary, location, description and SEQUENCE (RFC 5545 3.8.1.12, 3.8.1.7, 3.8.1.5, 3.8.7.4)', () => {
    const parsed = events(build());
    const first = parsed.find((e) => e.uid === stopEventUid(days[0]!.id, days[0]!.stops[0]!.stopId))!;
    expect(first.summary).toBe('Salon Quill, demo');
    expect(first.location).toBe('12 Birch Row, Larkhaven');
    expect(first.description).toContain('09:00–10:00');
    expect(first.description).toContain('Parking: Back lot');
    expect(first.description).toContain('Door: Ring twice');
    expect(first.sequence).toBe(3);
    const second = parsed.find((e) => e.uid === stopEventUid(days[1]!.id, days[1]!.stops[0]!.stopId))!;
    // TEXT escaping of ';' ',' and '"' (RFC 5545 3.3.11) survives the round trip.
    expect(second.summary).toBe('Groomer; "Comma, Inc."');
    expect(second.description).toContain('23:00–23:59');
    const day = parsed.find((e) => e.uid === dayEventUid(days[0]!.id))!;
    expect(day.summary).toBe('Route day: 1 stop, 84 km');
  });

  it('names the calendar and declares the zone it uses (RFC 5545 3.2.19: a VTIMEZONE for every TZID)', () => {
    const text = build();
    expect(text).toContain('X-WR-CALNAME:Keenroute route days – Robin Demo');
    const tzids = new Set([...text.matchAll(/TZID=([^:;]+)/g)].map((m) => m[1]));
    expect([...tzids]).toEqual([TZ]);
    expect(text).toContain(`BEGIN:VTIMEZONE\r\nTZID:${TZ}`);
  });

  it('leaves out the day event of a day without stops', () => {
    const empty: CalendarRouteDay = { ...days[0]!, departure: null, finish: null, stops: [] };
    const text = routeDayCalendar({
      sharpenerName: 'R',
      timeZone: TZ,
      from: new Date(),
      to: new Date(),
      days: [empty],
    });
    expect(events(text)).toHaveLength(0);
  });
});

describe('vtimezone', () => {
  it('has the 2026 US changes as onsets in the prior offset (RFC 5545 3.6.5)', () => {
    const text = vtimezone(TZ, new Date('2026-01-01T00:00:00Z'), new Date('2026-12-31T00:00:00Z'));
    expect(text).toContain('BEGIN:DAYLIGHT\r\nDTSTART:20260308T020000\r\nTZOFFSETFROM:-0600\r\nTZOFFSETTO:-0500');
    expect(text).toContain('BEGIN:STANDARD\r\nDTSTART:20261101T020000\r\nTZOFFSETFROM:-0500\r\nTZOFFSETTO:-0600');
  });

  it('has one standard observance for a zone without changes', () => {
    const text = vtimezone('Asia/Kolkata', new Date('2026-01-01T00:00:00Z'), new Date('2026-12-31T00:00:00Z'));
    expect(text.match(/BEGIN:(STANDARD|DAYLIGHT)/g)).toEqual(['BEGIN:STANDARD']);
    expect(text).toContain('TZOFFSETTO:+0530');
  });
});

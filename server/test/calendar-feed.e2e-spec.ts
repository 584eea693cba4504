import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { addDays, type Role } from '@keenroute/shared';
import ical, { type VEvent } from 'node-ical';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import type { AppConfig } from '../src/config/environment';
import { RouteDayStop } from '../src/route-days/entities/route-day-stop.entity';
import { RouteDay } from '../src/route-days/entities/route-day.entity';
import { Stop } from '../src/stops/entities/stop.entity';
import { todayIn } from '../src/stops/business-today';
import { createTestApp, createUser, signIn } from './utils/test-app';

/**
 * The instant a wall-clock time in `timeZone` names, found by trying every quarter-hour offset and asking Intl which
 * one reads back as that wall time: independent of the server's own conversion.
 */
function instantOf(timeZone: string, day: string, minute: number): number {
  const [y, m, d] = day.split('-').map(Number) as [number, number, number];
  const wall = Date.UTC(y, m - 1, d, 0, minute);
  const format = new Intl.DateTimeFormat('en-CA', {
    timeZone,
    hourCycle: 'h23',
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
  });
  const expected = `${day}, ${String(Math.floor(minute / 60)).padStart(2, '0')}:${String(minute % 60).padStart(2, '0')}`;
  for (let offset = -14 * 60; offset <= 14 * 60; offset += 15) {
    const candidate = wall - offset * 60_000;
    if (format.format(candidate) === expected) return candidate;
  }
  throw new Error(`${day} ${minute} does not exist in ${timeZone}`);
}

const eventsOf = (text: string) =>
  Object.values(ical.sync.parseICS(text)).filter((c): c is VEvent => (c as VEvent | undefined)?.type === 'VEVENT');

/** The sharpeners' iCalendar feeds (RFC 5545) against the real app and database. */
describe('calendar feed (e2e)', () => {
  let app: INestApplication<App>;
  let dataSource: DataSource;
  let timeZone: string;
  let today: string;
  const http = () => request(app.getHttpServer());
  const tokens = {} as Record<Role | 'other', string>;
  const ids = {} as Record<Role | 'other', string>;
  const bearer = (who: keyof typeof tokens) => ({ Authorization: `Bearer ${tokens[who]}` });
  const tag = randomUUID().slice(0, 8);
  const path = (url: string) => new URL(url).pathname;
  const feedUrl = async (who: keyof typeof tokens) =>
    (await http().get('/api/route-days/calendar-feed').set(bearer(who)).expect(200)).body.url as string;

  interface Planned {
    routeDay: RouteDay;
    stops: { stop: Stop; row: RouteDayStop }[];
  }
  const plan = async (sharpenerId: string, day: string, label: string, arrivals: number[]): Promise<Planned> => {
    const routeDay = await dataSource.getRepository(RouteDay).save({
      sharpenerId,
      day,
      startLabel: 'Demo base',
      startLatitude: 44.8,
      startLongitude: -92.4,
      shiftStart: 480,
      latestFinish: 1080,
      lunchEarliest: 690,
      lunchLatest: 810,
      lunchMinutes: 30,
      departure: arrivals[0]! - 25,
      finish: arrivals.at(-1)! + 95,
      distanceKm: 52.4,
    });
    const stops = [];
    for (const [position, arrival] of arrivals.entries()) {
      const stop = await dataSource.getRepository(Stop).save({
        name: `Salon ${label}-${position} ${tag} (demo)`,
        kind: 'salon',
        street: `${position + 1} ${label} Street`,
        city: 'Larkhaven',
        cadenceWeeks: 8,
        accessParking: 'Back lot',
        accessDoor: '',
        accessBestTime: 'After 10',
      });
      const row = await dataSource.getRepository(RouteDayStop).save({
        routeDayId: routeDay.id,
        stopId: stop.id,
        position,
        arrival,
        start: arrival,
        leave: arrival + 55,
        benchMinutes: 55,
      });
      stops.push({ stop, row });
    }
    return { routeDay, stops };
  };

  let mine: Planned[];
  let theirs: Planned;

  beforeAll(async () => {
    app = await createTestApp();
    dataSource = app.get(DataSource);
    timeZone = app.get<ConfigService<AppConfig, true>>(ConfigService).get('BUSINESS_TIME_ZONE', { infer: true });
    today = todayIn(timeZone);
    for (const role of ['owner', 'office', 'sharpener', 'client', 'other'] as const) {
      const user = await createUser(app, role === 'other' ? 'sharpener' : role, {
        name: role === 'sharpener' ? `Robin ${tag}` : `E2E ${role}`,
      });
      ids[role] = user.id;
      tokens[role] = (await signIn(app, user.email)).token;
    }
    mine = [
      await plan(ids.sharpener, addDays(today, -3), 'Past', [9 * 60 + 5]),
      await plan(ids.sharpener, addDays(today, 2), 'Soon', [8 * 60 + 40, 10 * 60 + 20]),
      await plan(ids.sharpener, addDays(today, -20), 'TooOld', [9 * 60]),
      await plan(ids.sharpener, addDays(today, 100), 'TooFar', [9 * 60]),
    ];
    theirs = await plan(ids.other, addDays(today, 2), 'Theirs', [11 * 60]);
  });
  afterAll(async () => {
    await app.close();
  });

  it('gives the caller one secret address, the same on every call', async () => {
    const url = await feedUrl('sharpener');
    expect(url).toMatch(/^https?:\/\/.+\/api\/calendar\/[A-Za-z0-9_-]{43}\.ics$/);
    expect(await feedUrl('sharpener')).toBe(url);
    expect(await feedUrl('other')).not.toBe(url);
    await feedUrl('owner');
  });

  it('refuses clients and the office, and anyone signed out', async () => {
    await http().get('/api/route-days/calendar-feed').set(bearer('client')).expect(403);
    await http().get('/api/route-days/calendar-feed').set(bearer('office')).expect(403);
    await http().post('/api/route-days/calendar-feed/renew').set(bearer('client')).expect(403);
    await http().get('/api/route-days/calendar-feed').expect(401);
  });

  it('serves the feed without sign-in as text/calendar, privately cached for five minutes', async () => {
    const response = await http()
      .get(path(await feedUrl('sharpener')))
      .expect(200);
    expect(response.headers['content-type']).toMatch(/^text\/calendar; charset=utf-8/);
    expect(response.headers['cache-control']).toBe('private, max-age=300');
    expect(response.text).toMatch(/^BEGIN:VCALENDAR\r\nVERSION:2\.0\r\n/);
    expect(response.text).toContain(`X-WR-CALNAME:Keenroute route days – Robin ${tag}`);
    // RFC 5545 3.2.19: every TZID used has its VTIMEZONE in the object.
    expect(response.text).toContain(`BEGIN:VTIMEZONE\r\nTZID:${timeZone}\r\n`);
  });

  it("has an event per stop at the planned minutes in the business's zone, with summary, location and UID", async () => {
    const events = eventsOf(
      (
        await http()
          .get(path(await feedUrl('sharpener')))
          .expect(200)
      ).text,
    );
    const [past, soon] = mine;
    const expected = [past!, soon!].flatMap(({ routeDay, stops }) => stops.map((s) => ({ routeDay, ...s })));
    for (const { routeDay, stop, row } of expected) {
      // RFC 5545 3.8.4.7: a UID per route day stop, the same on every fetch so calendar apps update in place.
      const event = events.find((e) => e.uid === `${routeDay.id}.${stop.id}@keenroute`);
      expect(event).toBeDefined();
      // RFC 5545 3.3.5 (date with local time and time zone reference) and 3.8.2.4 / 3.8.2.2 DTSTART and DTEND.
      expect(event!.start.getTime()).toBe(instantOf(timeZone, routeDay.day, row.arrival));
      expect(event!.end!.getTime()).toBe(instantOf(timeZone, routeDay.day, row.leave));
      expect(event!.start.tz).toBe(timeZone);
      // RFC 5545 3.8.1.12 SUMMARY, 3.8.1.7 LOCATION, 3.8.1.5 DESCRIPTION.
      expect(event!.summary).toBe(stop.name);
      expect(event!.location).toBe(`${stop.street}, ${stop.city}`);
      expect(event!.description).toMatch(/Arrival window told to the stop: \d\d:\d\d–\d\d:\d\d/);
      expect(event!.description).toContain('Parking: Back lot');
    }
    const soonDay = events.find((e) => e.uid === `${soon!.routeDay.id}@keenroute`)!;
    expect(soonDay.summary).toBe('Route day: 2 stops, 52 km');
    expect(soonDay.start.getTime()).toBe(instantOf(timeZone, soon!.routeDay.day, soon!.routeDay.departure!));
    expect(soonDay.end!.getTime()).toBe(instantOf(timeZone, soon!.routeDay.day, soon!.routeDay.finish!));
    // Two days with stops in the window: 2 day events and 3 stop events; 20 days back and 100 ahead are left out.
    expect(events).toHaveLength(5);
  });

  it('shows another sharpener only their own days', async () => {
    const events = eventsOf(
      (
        await http()
          .get(path(await feedUrl('other')))
          .expect(200)
      ).text,
    );
    expect(events.map((e) => e.uid).sort()).toEqual(
      [`${theirs.routeDay.id}@keenroute`, `${theirs.routeDay.id}.${theirs.stops[0]!.stop.id}@keenroute`].sort(),
    );
  });

  it('renews the address: the old one answers 404, the new one works', async () => {
    const old = await feedUrl('sharpener');
    const renewed = (await http().post('/api/route-days/calendar-feed/renew').set(bearer('sharpener')).expect(200)).body
      .url as string;
    expect(renewed).not.toBe(old);
    expect(await feedUrl('sharpener')).toBe(renewed);
    await http().get(path(old)).expect(404);
    await http().get(path(renewed)).expect(200);
  });

  it('answers 404 for a token nobody holds or a malformed one', async () => {
    await http()
      .get(`/api/calendar/${'A'.repeat(43)}.ics`)
      .expect(404);
    await http().get('/api/calendar/short.ics').expect(404);
  });
});

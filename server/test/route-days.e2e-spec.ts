import type { INestApplication } from '@nestjs/common';
import {
  addDays,
  benchMinutes,
  minutesOfDay,
  weekStart,
  weekdayOf,
  type OpeningHours,
  type Role,
} from '@keenroute/shared';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { ExpectedBenchService } from '../src/route-days/planning/expected-bench';
import type { RouteDayDto, WeekDto } from '../src/route-days/dto/route-day-response.dto';
import { RouteDaysService } from '../src/route-days/route-days.service';
import { createTestApp, createUser, signIn } from './utils/test-app';
import { pdfText } from './utils/binary';

/**
 * Route days through the API: planning settings, "plan the week", moves, locks, the day sheet, and who may do what.
 * Every planned day is checked here against the stops' own opening hours, not against the planner's code.
 */
describe('route days (e2e)', () => {
  let app: INestApplication<App>;
  const http = () => request(app.getHttpServer());
  const tokens = {} as Record<Role | 'otherSharpener', string>;
  const ids = {} as Record<Role | 'otherSharpener', string>;
  const bearer = (who: keyof typeof tokens) => ({ Authorization: `Bearer ${tokens[who]}` });
  const weekdayHours = { opens: '09:00', closes: '17:00' };
  const OPEN_WEEKDAYS: OpeningHours = {
    mon: [weekdayHours],
    tue: [weekdayHours],
    wed: [weekdayHours],
    thu: [weekdayHours],
    fri: [weekdayHours],
  };
  const settings = {
    baseLabel: 'E2E workshop',
    baseLatitude: 44.8,
    baseLongitude: -92.4,
    workWeekdays: ['mon', 'tue', 'wed', 'thu', 'fri'],
    shiftStart: 480,
    latestFinish: 1080,
    lunchEarliest: 690,
    lunchLatest: 810,
    lunchMinutes: 30,
    circuity: 1.3,
    averageSpeedKmh: 40,
    noticeDays: 3,
    solveSeconds: 1,
  };
  const stops: { id: string; name: string; openingHours: OpeningHours }[] = [];
  let nextWeek: string;

  const createStop = async (overrides: Record<string, unknown>) => {
    const name = `Route e2e ${randomUUID().slice(0, 6)}`;
    const body = {
      name,
      kind: 'salon',
      street: `${stops.length + 1} Planner Row`,
      city: 'Larkhaven',
      latitude: 44.8 + (stops.length % 4) * 0.01,
      longitude: -92.4 + Math.floor(stops.length / 4) * 0.012,
      openingHours: OPEN_WEEKDAYS,
      assignedSharpenerId: ids.sharpener,
      ...overrides,
    };
    const created = (await http().post('/api/stops').set(bearer('office')).send(body).expect(201)).body as {
      id: string;
    };
    stops.push({ id: created.id, name, openingHours: body.openingHours });
    return created.id;
  };

  const plan = async (who: keyof typeof tokens = 'office') =>
    (
      await http()
        .post('/api/route-days/plan')
        .set(bearer(who))
        .send({ week: nextWeek, sharpenerIds: [ids.sharpener] })
        .expect(200)
    ).body as WeekDto;

  const mine = (week: WeekDto) => week.days.filter((d) => d.sharpener.id === ids.sharpener);

  /** Independent check of one day: order, windows inside opening hours, bench work ends by closing, day length. */
  const expectFeasible = (day: RouteDayDto) => {
    let clock = day.shiftStart;
    day.stops.forEach((stop, index) => {
      expect(stop.position).toBe(index);
      expect(stop.arrival).toBeGreaterThanOrEqual(clock);
      expect(stop.start).toBeGreaterThanOrEqual(stop.arrival);
      expect(stop.leave).toBe(stop.start + stop.benchMinutes);
      const hours = stops.find((s) => s.id === stop.stopId)!.openingHours[weekdayOf(day.day)] ?? [];
      const inside = hours.some((w) => stop.start >= minutesOfDay(w.opens)! && stop.leave <= minutesOfDay(w.closes)!);
      expect(inside).toBe(true);
      expect(stop.problem).toBeNull();
      clock = stop.leave;
    });
    if (day.stops.length > 0) expect(day.finish!).toBeLessThanOrEqual(day.latestFinish);
  };

  beforeAll(async () => {
    app = await createTestApp();
    for (const role of ['owner', 'office', 'sharpener', 'client', 'otherSharpener'] as const) {
      const user = await createUser(app, role === 'otherSharpener' ? 'sharpener' : role);
      ids[role] = user.id;
      tokens[role] = (await signIn(app, user.email)).token;
    }
    nextWeek = weekStart(addDays(app.get(RouteDaysService).today(), 7));
    await http().put('/api/route-days/settings').set(bearer('owner')).send(settings).expect(200);
    for (let i = 0; i < 8; i++) await createStop({});
    await createStop({ openingHours: { sun: [weekdayHours] } });
    await createStop({ latitude: null, longitude: null });
    await createStop({ openingHours: { mon: [{ opens: '09:00', closes: '09:05' }] } });
  });
  afterAll(async () => {
    await app.close();
  });

  describe('planning settings', () => {
    it('lets the owner set them and the office read them; others are refused', async () => {
      const read = await http().get('/api/route-days/settings').set(bearer('office')).expect(200);
      expect(read.body).toMatchObject({ baseLabel: 'E2E workshop', circuity: 1.3 });
      await http().put('/api/route-days/settings').set(bearer('office')).send(settings).expect(403);
      await http().get('/api/route-days/settings').set(bearer('sharpener')).expect(403);
    });

    it('refuses a finish before the start with a field message', async () => {
      const response = await http()
        .put('/api/route-days/settings')
        .set(bearer('owner'))
        .send({ ...settings, latestFinish: 400 })
        .expect(400);
      expect(response.body.fields.latestFinish).toBeDefined();
      await http()
        .put('/api/route-days/settings')
        .set(bearer('owner'))
        .send({ ...settings, circuity: 0.8 })
        .expect(400);
    });
  });

  describe('plan the week', () => {
    let week: WeekDto;
    beforeAll(async () => {
      week = await plan();
    });

    it('makes a route day per work day and plans every stop or says why not', () => {
      const days = mine(week);
      expect(days.map((d) => d.weekday)).toEqual(['mon', 'tue', 'wed', 'thu', 'fri']);
      const planned = days.flatMap((d) => d.stops.map((s) => s.stopId));
      expect(new Set(planned).size).toBe(planned.length);
      const reasons = new Map(week.unplanned.map((u) => [u.stopId, u.reason]));
      for (const stop of stops) expect(planned.includes(stop.id) !== reasons.has(stop.id)).toBe(true);
      expect(reasons.get(stops[8]!.id)).toBe('closed-all-week');
      expect(reasons.get(stops[9]!.id)).toBe('no-coordinates');
      expect(reasons.get(stops[10]!.id)).toBe('window-closed');
      for (const stop of stops.slice(0, 8)) expect(planned).toContain(stop.id);
      expect(week.unplanned.every((u) => u.reasonText.length > 10)).toBe(true);
    });

    it('keeps every stop inside its opening hours and every day inside its hours', () => {
      for (const day of mine(week)) expectFeasible(day);
    });

    it('adds up each day: bench minutes from the rules package, km and drive minutes', () => {
      for (const day of mine(week).filter((d) => d.stops.length > 0)) {
        // No shears registered at these stops: each visit is the setup only (10 minutes, common practice).
        for (const stop of day.stops) expect(stop.benchMinutes).toBe(10);
        expect(day.benchMinutes).toBe(day.stops.length * 10);
        expect(day.distanceKm).toBeGreaterThan(0);
        expect(day.driveMinutes).toBeGreaterThan(0);
        expect(day.departure).toBe(day.shiftStart);
      }
    });

    it('takes drive figures from the routing service when one is set, else from the great-circle estimate', () => {
      const day = mine(week).find((d) => d.stops.length > 0)!;
      const first = day.stops[0]!;
      const [a, b] = [day.start, first];
      const rad = Math.PI / 180;
      let expected: number;
      if (process.env.ROUTING_URL) {
        // The routing stand-in drives the grid: north-south plus east-west km (111.32 km per degree, from memory).
        const north = Math.abs(a.latitude - b.latitude) * 111.32;
        const east = Math.abs(a.longitude - b.longitude) * 111.32 * Math.cos(((a.latitude + b.latitude) / 2) * rad);
        expected = north + east;
      } else {
        // Haversine formula, mean Earth radius 6371.0088 km (IUGG), times the circuity setting.
        const h =
          Math.sin(((b.latitude - a.latitude) * rad) / 2) ** 2 +
          Math.cos(a.latitude * rad) *
            Math.cos(b.latitude * rad) *
            Math.sin(((b.longitude - a.longitude) * rad) / 2) ** 2;
        expected = 2 * 6371.0088 * Math.asin(Math.sqrt(h)) * settings.circuity;
      }
      expect(first.kmBefore).toBeCloseTo(expected, 1);
    });

    it('is refused to a sharpener and a client', async () => {
      await http().post('/api/route-days/plan').set(bearer('sharpener')).send({ week: nextWeek }).expect(403);
      await http().post('/api/route-days/plan').set(bearer('client')).send({ week: nextWeek }).expect(403);
      await http().post('/api/route-days/plan').set(bearer('office')).send({ week: 'soon' }).expect(400);
    });
  });

  describe('reading', () => {
    it('shows a sharpener only their own days, and a client none', async () => {
      const own = (await http().get(`/api/route-days?week=${nextWeek}`).set(bearer('sharpener')).expect(200))
        .body as WeekDto;
      expect(own.days.length).toBe(5);
      expect(own.days.every((d) => d.sharpener.id === ids.sharpener)).toBe(true);
      const other = (await http().get(`/api/route-days?week=${nextWeek}`).set(bearer('otherSharpener')).expect(200))
        .body as WeekDto;
      expect(other.days).toEqual([]);
      const dayId = own.days[0]!.id;
      await http().get(`/api/route-days/${dayId}`).set(bearer('otherSharpener')).expect(404);
      await http().get(`/api/route-days/${dayId}`).set(bearer('client')).expect(403);
      await http().get(`/api/route-days?week=${nextWeek}`).set(bearer('client')).expect(403);
    });
  });

  describe('moving and locking', () => {
    let bookedStopId: string | undefined;
    const week = async () =>
      mine((await http().get(`/api/route-days?week=${nextWeek}`).set(bearer('office')).expect(200)).body as WeekDto);

    it('moves a stop to another day, re-times both days at once and locks it there', async () => {
      const days = await week();
      const from = days.find((d) => d.stops.length > 0)!;
      const to = days.find((d) => d.id !== from.id)!;
      const moved = from.stops[from.stops.length - 1]!;
      const response = await http()
        .post(`/api/route-days/${to.id}/stops`)
        .set(bearer('office'))
        .send({ stopId: moved.stopId, position: 0, version: to.version })
        .expect(200);
      const changed = response.body.days as RouteDayDto[];
      expect(changed.map((d) => d.id).sort()).toEqual([from.id, to.id].sort());
      const newTo = changed.find((d) => d.id === to.id)!;
      const newFrom = changed.find((d) => d.id === from.id)!;
      expect(newTo.stops[0]).toMatchObject({ stopId: moved.stopId, position: 0, locked: true });
      expect(newTo.stops[0]!.arrival).toBe(newTo.shiftStart + newTo.stops[0]!.driveMinutesBefore);
      expect(newFrom.stops.map((s) => s.stopId)).not.toContain(moved.stopId);
      expect(newTo.version).toBeGreaterThan(to.version);
      expectFeasible(newTo);
    });

    it('refuses a change made against an old version of the day', async () => {
      const days = await week();
      const day = days.find((d) => d.stops.length > 1)!;
      await http()
        .post(`/api/route-days/${day.id}/stops`)
        .set(bearer('office'))
        .send({ stopId: day.stops[0]!.stopId, position: 1, version: day.version - 1 })
        .expect(409);
    });

    it('lets the sharpener re-order their own day but not add a stop or touch another sharpener', async () => {
      const days = await week();
      const day = days.find((d) => d.stops.length > 1)!;
      const first = day.stops[0]!;
      const response = await http()
        .post(`/api/route-days/${day.id}/stops`)
        .set(bearer('sharpener'))
        .send({ stopId: first.stopId, position: 1 })
        .expect(200);
      const after = (response.body.days as RouteDayDto[])[0]!;
      expect(after.stops[1]!.stopId).toBe(first.stopId);
      const planned = new Set(days.flatMap((d) => d.stops.map((s) => s.stopId)));
      const notPlanned = stops.find((s) => !planned.has(s.id) && s.openingHours.mon)!;
      await http()
        .post(`/api/route-days/${day.id}/stops`)
        .set(bearer('sharpener'))
        .send({ stopId: notPlanned.id, position: 0 })
        .expect(403);
      await http()
        .post(`/api/route-days/${day.id}/stops`)
        .set(bearer('otherSharpener'))
        .send({ stopId: first.stopId, position: 0 })
        .expect(404);
      await http().delete(`/api/route-days/${day.id}/stops/${first.stopId}`).set(bearer('sharpener')).expect(403);
    });

    it('keeps a stop locked to its day and position when the week is planned again', async () => {
      const days = await week();
      const day = days.find((d) => d.stops.length > 1)!;
      const target = day.stops[1]!;
      const locked = await http()
        .post(`/api/route-days/${day.id}/stops/${target.stopId}/lock`)
        .set(bearer('sharpener'))
        .send({ keepPosition: true })
        .expect(200);
      expect((locked.body as RouteDayDto).stops[1]).toMatchObject({ locked: true, positionLocked: true });
      const replanned = mine(await plan());
      const again = replanned.find((d) => d.id === day.id)!;
      expect(again.stops[1]).toMatchObject({ stopId: target.stopId, locked: true, positionLocked: true });
      for (const d of replanned) expectFeasible(d);
      const unlocked = await http()
        .post(`/api/route-days/${day.id}/stops/${target.stopId}/unlock`)
        .set(bearer('office'))
        .expect(200);
      expect((unlocked.body as RouteDayDto).stops[1]).toMatchObject({ locked: false, positionLocked: false });
    });

    it('keeps a stop with drop-offs booked on its day: no moving it off, and re-planning leaves it there', async () => {
      const days = await week();
      const day = days.find((d) => d.stops.length > 0 && d.stops.some((s) => !s.positionLocked))!;
      const booked = day.stops.find((s) => !s.positionLocked)!;
      bookedStopId = booked.stopId;
      await http().post(`/api/route-days/${day.id}/stops/${booked.stopId}/unlock`).set(bearer('office')).expect(200);
      await http()
        .post('/api/public/bookings')
        .send({
          stopId: booked.stopId,
          routeDayId: day.id,
          mailIn: false,
          name: 'Route Test Groomer',
          email: `route-${randomUUID().slice(0, 6)}@e2e.keenroute.test`,
          phone: '555-0100',
          consent: true,
          items: [{ toolKind: 'straight', edgeType: 'beveled', count: 2 }],
          website: '',
          idempotencyKey: randomUUID(),
        })
        .expect(201);
      const other = days.find((d) => d.id !== day.id)!;
      const refused = await http()
        .post(`/api/route-days/${other.id}/stops`)
        .set(bearer('office'))
        .send({ stopId: booked.stopId, position: 0 })
        .expect(409);
      expect(refused.body.message).toMatch(/drop-off/);
      await http().delete(`/api/route-days/${day.id}/stops/${booked.stopId}`).set(bearer('office')).expect(409);
      const replanned = mine(await plan());
      expect(replanned.find((d) => d.id === day.id)!.stops.map((s) => s.stopId)).toContain(booked.stopId);
    });

    it('takes a stop off a day into the unplanned list', async () => {
      const days = await week();
      const day = days.find((d) => d.stops.some((s) => s.stopId !== bookedStopId))!;
      const off = day.stops.find((s) => s.stopId !== bookedStopId)!.stopId;
      await http().delete(`/api/route-days/${day.id}/stops/${off}`).set(bearer('office')).expect(200);
      const after = (await http().get(`/api/route-days?week=${nextWeek}`).set(bearer('office')).expect(200))
        .body as WeekDto;
      expect(after.unplanned.find((u) => u.stopId === off)?.reason).toBe('taken-off');
      expect(mine(after).some((d) => d.stops.some((s) => s.stopId === off))).toBe(false);
    });
  });

  describe('expected bench minutes', () => {
    it("count the stop's shears by the rules package, scaled to the pairs serviced at its recent visits", async () => {
      const stopId = await createStop({ openingHours: OPEN_WEEKDAYS });
      const customerId = (
        await http()
          .post('/api/customers')
          .set(bearer('office'))
          .send({ name: 'Bench e2e groomer', stopId })
          .expect(201)
      ).body.id as string;
      const shears: { id: string }[] = [];
      for (const edgeType of ['beveled', 'beveled', 'convex', 'convex']) {
        const shear = await http()
          .post('/api/shears')
          .set(bearer('office'))
          .send({ customerId, lengthIn: 6, edgeType, toolKind: 'straight' })
          .expect(201);
        shears.push(shear.body as { id: string });
      }
      const bench = app.get(ExpectedBenchService);
      // Rules package bench time (common practice): setup 10, beveled 10 and convex 18 per pair: 66 minutes.
      const all = benchMinutes([
        { edgeType: 'beveled', toolKind: 'straight', count: 2 },
        { edgeType: 'convex', toolKind: 'straight', count: 2 },
      ]);
      expect(all).toBe(10 + 2 * 10 + 2 * 18);
      expect((await bench.forStops([stopId])).get(stopId)).toEqual({ pairs: 4, minutes: all });
      // Two of the four serviced at the one visit worked: half the pair minutes are expected next time.
      const day = addDays(app.get(RouteDaysService).today(), -14);
      await http().post(`/api/stops/${stopId}/visits`).set(bearer('office')).send({ workedOn: day }).expect(201);
      const db = app.get(DataSource);
      for (const shear of shears.slice(0, 2)) {
        await db.query(
          `INSERT INTO shear_history (shear_id, happened_on, kind, summary) VALUES ($1, $2, 'serviced', 'e2e')`,
          [shear.id, day],
        );
      }
      expect((await bench.forStops([stopId])).get(stopId)).toEqual({ pairs: 2, minutes: 10 + (all - 10) / 2 });
    });
  });

  describe('day sheet', () => {
    it('lists the stops in order with contacts and totals, as JSON and as a PDF', async () => {
      const days = mine(
        (await http().get(`/api/route-days?week=${nextWeek}`).set(bearer('sharpener'))).body as WeekDto,
      );
      const day = days.find((d) => d.stops.length > 0)!;
      const sheet = await http().get(`/api/route-days/${day.id}/sheet`).set(bearer('sharpener')).expect(200);
      expect(sheet.body.stops.map((s: { stopId: string }) => s.stopId)).toEqual(day.stops.map((s) => s.stopId));
      expect(sheet.body.totals).toMatchObject({ stops: day.stops.length, benchMinutes: day.benchMinutes });
      expect(sheet.body.cautions.join(' ')).toMatch(/equipment maker/);
      const first = sheet.body.stops[0];
      expect(first.arrivalWindow.from).toBeLessThanOrEqual(first.arrival);
      expect(first.arrivalWindow.to).toBeGreaterThan(first.arrival);

      const pdf = await http()
        .get(`/api/route-days/${day.id}/sheet?format=pdf`)
        .set(bearer('sharpener'))
        .buffer(true)
        .parse((res, done) => {
          const chunks: Buffer[] = [];
          res.on('data', (chunk: Buffer) => chunks.push(chunk));
          res.on('end', () => done(null, Buffer.concat(chunks)));
        })
        .expect(200);
      expect(pdf.headers['content-type']).toBe('application/pdf');
      const text = await pdfText(pdf.body as Buffer);
      expect(text).toContain(day.stops[0]!.name);
      expect(text).toContain('Day sheet');
      await http().get(`/api/route-days/${day.id}/sheet`).set(bearer('otherSharpener')).expect(404);
    });
  });
});

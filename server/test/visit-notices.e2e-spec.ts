import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { addDays, type Role } from '@keenroute/shared';
import { randomInt, randomUUID } from 'node:crypto';
import { createServer } from 'node:net';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { validateEnvironment, type AppConfig } from '../src/config/environment';
import { Customer } from '../src/customers/entities/customer.entity';
import { JobsService } from '../src/jobs/jobs.service';
import { MailService, type OutgoingMail } from '../src/mail/mail.service';
import { PlanningSettings } from '../src/route-days/entities/planning-settings.entity';
import { RouteDayStop } from '../src/route-days/entities/route-day-stop.entity';
import { RouteDay } from '../src/route-days/entities/route-day.entity';
import { VisitNotice } from '../src/route-days/entities/visit-notice.entity';
import { VisitNoticeDelivery, VisitNoticeFailed } from '../src/route-days/notices/visit-notice-delivery';
import { VISIT_NOTICE_QUEUE } from '../src/route-days/notices/visit-notices.service';
import { Stop } from '../src/stops/entities/stop.entity';
import { mailTo, waitForMail, type CaughtMail } from './utils/mail-catcher';
import { createTestApp, createUser, signIn } from './utils/test-app';

/** Polls until `check` returns a value, or fails after the timeout: jobs run on pg-boss's own schedule. */
async function eventually<T>(what: string, check: () => Promise<T | undefined>, timeoutMs = 20_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await check();
    if (value !== undefined) return value;
    if (Date.now() > deadline) throw new Error(`Timed out waiting for ${what}.`);
    await new Promise((resolve) => setTimeout(resolve, 150));
  }
}

/** A port nothing listens on: bound, then closed, so SMTP there is refused at once. */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as { port: number };
  await new Promise((resolve) => server.close(resolve));
  return port;
}

/**
 * Visit notices through the real pg-boss queue, the real database and the local mail catcher. Route days are
 * written straight to the tables on a far-future "today" picked per run, so no other test's days are on them.
 */
describe('visit notices (e2e)', () => {
  let app: INestApplication<App>;
  let dataSource: DataSource;
  const http = () => request(app.getHttpServer());
  const tokens = {} as Record<Role, string>;
  const bearer = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });
  const tag = randomUUID().slice(0, 8);
  const address = (who: string) => `${who}-${tag}@notices.demo.test`;
  let sharpenerId: string;
  let appUrl: string;
  let today: string;
  let noticeDays: number;
  let serial = 0;

  const makeStop = async (label: string, email: string | null) =>
    dataSource.getRepository(Stop).save({
      name: `Salon ${label} ${tag} (demo)`,
      kind: 'salon',
      street: `${++serial} ${label} Street`,
      city: 'Larkhaven',
      cadenceWeeks: 8,
      email,
    });
  const makeCustomer = (stop: Stop, label: string, consent: boolean, email: string | null, active = true) =>
    dataSource.getRepository(Customer).save({
      name: `Groomer ${label} (demo)`,
      email,
      stopId: stop.id,
      visitNoticeConsent: consent,
      active,
    });
  /** A route day straight in the tables: what the planner would have written. */
  const makeRouteDay = async (day: string, stops: { stop: Stop; arrival: number }[]) => {
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
      departure: 480,
      finish: 1000,
      distanceKm: 40,
    });
    await dataSource.getRepository(RouteDayStop).save(
      stops.map(({ stop, arrival }, position) => ({
        routeDayId: routeDay.id,
        stopId: stop.id,
        position,
        arrival,
        start: arrival,
        leave: arrival + 60,
        benchMinutes: 60,
      })),
    );
    return routeDay;
  };
  const noticesOf = (stopId: string, day: string) =>
    dataSource.getRepository(VisitNotice).find({ where: { stopId, day }, order: { recipient: 'ASC' } });
  const allSent = (stopId: string, day: string, count: number) =>
    eventually(`${count} sent notices`, async () => {
      const rows = await noticesOf(stopId, day);
      return rows.length === count && rows.every((row) => row.status === 'sent') ? rows : undefined;
    });
  const mailsTo = async (who: string): Promise<CaughtMail[]> => mailTo(address(who));

  beforeAll(async () => {
    app = await createTestApp();
    dataSource = app.get(DataSource);
    appUrl = app.get<ConfigService<AppConfig, true>>(ConfigService).get('APP_URL', { infer: true });
    for (const role of ['owner', 'office', 'sharpener', 'client'] as const) {
      const user = await createUser(app, role);
      tokens[role] = (await signIn(app, user.email)).token;
      if (role === 'sharpener') sharpenerId = user.id;
    }
    // The one settings row may already be there (another test or the demo); only its lead time matters here.
    await dataSource
      .createQueryBuilder()
      .insert()
      .into(PlanningSettings)
      .values({
        id: 1,
        baseLabel: 'Demo base',
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
        solveSeconds: 3,
      })
      .orIgnore()
      .execute();
    noticeDays = (await dataSource.getRepository(PlanningSettings).findOneByOrFail({ id: 1 })).noticeDays;
    today = `${randomInt(2300, 2900)}-${String(randomInt(1, 13)).padStart(2, '0')}-${String(randomInt(1, 29)).padStart(2, '0')}`;
  });
  afterAll(async () => {
    jest.restoreAllMocks();
    await app.close();
  });

  describe('queueDue and the job', () => {
    let day: string;
    let salon: Stop;
    let barber: Stop;
    let later: Stop;

    beforeAll(async () => {
      day = addDays(today, noticeDays);
      salon = await makeStop('Quill', address('salon'));
      await makeCustomer(salon, 'Avery', true, address('avery'));
      await makeCustomer(salon, 'Blake', false, address('blake'));
      await makeCustomer(salon, 'Casey', true, null);
      await makeCustomer(salon, 'Drew', true, address('drew'), false);
      barber = await makeStop('Fenmoor', null);
      await makeCustomer(barber, 'Emery', true, address('emery'));
      later = await makeStop('Later', address('later'));
      await makeRouteDay(day, [
        { stop: salon, arrival: 9 * 60 + 7 },
        { stop: barber, arrival: 11 * 60 + 40 },
      ]);
      await makeRouteDay(addDays(day, 1), [{ stop: later, arrival: 10 * 60 }]);
    });

    it('queues each stop on the day once and e-mails the stop and each consenting customer once', async () => {
      const run = await http().post('/api/route-days/notices/run').set(bearer('owner')).send({ today }).expect(200);
      expect(run.body).toEqual({ today, through: day, stops: 2, queued: 2 });

      const salonRows = await allSent(salon.id, day, 2);
      expect(salonRows.map((row) => row.recipient).sort()).toEqual([address('avery'), address('salon')].sort());
      expect(salonRows.every((row) => row.attempts === 1 && row.sentAt !== null)).toBe(true);
      await allSent(barber.id, day, 1);

      const mail = await waitForMail(address('salon'), /^Keenroute visit on /);
      expect(mail.subject).toMatch(/^Keenroute visit on \w{3} \d{1,2} \w{3,4}: expected 09:00–10:00$/);
      expect(mail.text).toContain(`${appUrl.replace(/\/$/, '')}/book?stop=${salon.id}&day=${day}`);
      expect(mail.text).toContain('between 09:00 and 10:00');
      expect(mail.text).toMatch(/estimate/);
      expect((await waitForMail(address('emery'), /expected 11:30–12:30$/)).text).toContain(`stop=${barber.id}`);
      expect(await mailsTo('avery')).toHaveLength(1);
      expect(await mailsTo('salon')).toHaveLength(1);
      // Blake did not consent, Drew's customer record is inactive, and the later day is beyond the lead time.
      expect(await mailsTo('blake')).toHaveLength(0);
      expect(await mailsTo('drew')).toHaveLength(0);
      expect(await mailsTo('later')).toHaveLength(0);
      expect(await noticesOf(later.id, addDays(day, 1))).toHaveLength(0);
    });

    it('sends nothing more when queueDue runs again, twice at once, or the job runs again', async () => {
      const runs = await Promise.all(
        [1, 2].map(() => http().post('/api/route-days/notices/run').set(bearer('owner')).send({ today }).expect(200)),
      );
      expect(runs.map((r) => r.body.queued)).toEqual([0, 0]);
      // Past pg-boss's hourly slot the job runs again: the notices table alone must stop a second e-mail.
      await expect(app.get(VisitNoticeDelivery).deliver({ stopId: salon.id, day })).resolves.toEqual({
        sent: 0,
        skipped: 2,
        failed: 0,
      });
      expect(await mailsTo('salon')).toHaveLength(1);
      expect(await mailsTo('avery')).toHaveLength(1);
      expect(await mailsTo('emery')).toHaveLength(1);
    });

    it('lists the notices of a day for the owner and the office', async () => {
      const response = await http().get('/api/route-days/notices').query({ day }).set(bearer('office')).expect(200);
      const items = response.body.items as { stopName: string; recipient: string; status: string }[];
      expect(items.map((i) => [i.stopName, i.recipient, i.status])).toEqual([
        [barber.name, address('emery'), 'sent'],
        ...[address('avery'), address('salon')].sort().map((r) => [salon.name, r, 'sent']),
      ]);
      expect(response.body.items[0]).toMatchObject({ attempts: 1, day, stopId: barber.id, lastError: null });
      expect(Date.parse(response.body.items[0].sentAt)).not.toBeNaN();
    });
  });

  describe('who may', () => {
    it('lets only the owner run notices, and owner and office list them', async () => {
      for (const role of ['office', 'sharpener', 'client'] as const) {
        await http().post('/api/route-days/notices/run').set(bearer(role)).send({ today }).expect(403);
      }
      for (const role of ['sharpener', 'client'] as const) {
        await http().get('/api/route-days/notices').query({ day: today }).set(bearer(role)).expect(403);
      }
      await http().get('/api/route-days/notices').query({ day: today }).set(bearer('owner')).expect(200);
      await http().post('/api/route-days/notices/run').send({ today }).expect(401);
    });

    it('refuses a malformed day', async () => {
      await http().get('/api/route-days/notices').query({ day: '2026-02-30' }).set(bearer('office')).expect(400);
      await http().get('/api/route-days/notices').set(bearer('office')).expect(400);
      await http().post('/api/route-days/notices/run').set(bearer('owner')).send({ today: 'soon' }).expect(400);
    });
  });

  describe('when the mail server fails', () => {
    it('marks the row failed with the attempt counted, throws for a retry, and sends on the retry', async () => {
      const day = addDays(today, 40);
      const stop = await makeStop('Outage', address('outage'));
      await makeRouteDay(day, [{ stop, arrival: 14 * 60 + 50 }]);
      const config = app.get<ConfigService<AppConfig, true>>(ConfigService);
      // A real MailService pointed at a port nothing listens on: SMTP refuses the connection.
      const settings = validateEnvironment({ ...process.env, SMTP_PORT: String(await closedPort()) });
      // A plain ConfigService would read SMTP_PORT from process.env first: this one answers from `settings` only.
      const refused = new MailService({
        get: (key: keyof AppConfig) => settings[key],
      } as unknown as ConfigService<AppConfig, true>);
      const failing = new VisitNoticeDelivery(dataSource, refused, config);

      await expect(failing.deliver({ stopId: stop.id, day })).rejects.toBeInstanceOf(VisitNoticeFailed);
      const [failed] = await noticesOf(stop.id, day);
      expect(failed).toMatchObject({ status: 'failed', attempts: 1, sentAt: null });
      expect(failed!.lastError).toMatch(/mail server/);
      expect(await mailsTo('outage')).toHaveLength(0);

      await expect(app.get(VisitNoticeDelivery).deliver({ stopId: stop.id, day })).resolves.toMatchObject({ sent: 1 });
      const [sent] = await noticesOf(stop.id, day);
      expect(sent).toMatchObject({ status: 'sent', attempts: 2 });
      expect((await waitForMail(address('outage'), /expected 14:45–15:45$/)).subject).toMatch(/^Keenroute visit/);
    });

    it('is retried by pg-boss after the handler throws', async () => {
      const day = addDays(today, 41);
      const stop = await makeStop('Retry', address('retry'));
      await makeRouteDay(day, [{ stop, arrival: 8 * 60 + 30 }]);
      const mail = app.get(MailService);
      const send = mail.send.bind(mail);
      let refusals = 0;
      jest.spyOn(mail, 'send').mockImplementation((outgoing: OutgoingMail) => {
        if (outgoing.to === address('retry') && refusals === 0) {
          refusals += 1;
          return Promise.resolve(false);
        }
        return send(outgoing);
      });
      // The queue waits 30 s and more between tries; this one job asks for pg-boss's shortest backoff instead.
      await app
        .get(JobsService)
        .send(VISIT_NOTICE_QUEUE, { stopId: stop.id, day }, { retryDelay: 1, retryBackoff: true, retryLimit: 3 });
      const [row] = await eventually('the retried notice', async () => {
        const rows = await noticesOf(stop.id, day);
        return rows[0]?.status === 'sent' ? rows : undefined;
      });
      expect(refusals).toBe(1);
      expect(row).toMatchObject({ status: 'sent', attempts: 2 });
      expect(await mailsTo('retry')).toHaveLength(1);
    });
  });

  describe('two app instances', () => {
    let second: INestApplication<App> | undefined;
    afterAll(async () => {
      await second?.close();
    });

    it('start together against one database and still send each notice once', async () => {
      const day = addDays(today, 60);
      const stop = await makeStop('Twins', address('twins'));
      await makeCustomer(stop, 'Finley', true, address('finley'));
      await makeRouteDay(day, [{ stop, arrival: 13 * 60 }]);
      // Two more apps booting at once: pg-boss's schema and queue set-up must not deadlock or fail.
      const [a, b] = await Promise.all([createTestApp(), createTestApp()]);
      second = b;
      await a.close();

      const job = { stopId: stop.id, day };
      const results = await Promise.all([
        app.get(VisitNoticeDelivery).deliver(job),
        b.get(VisitNoticeDelivery).deliver(job),
        app.get(VisitNoticeDelivery).deliver(job),
      ]);
      expect(results.reduce((sum, r) => sum + r.sent, 0)).toBe(2);
      expect(await mailsTo('twins')).toHaveLength(1);
      expect(await mailsTo('finley')).toHaveLength(1);
      expect((await noticesOf(stop.id, day)).map((row) => row.status)).toEqual(['sent', 'sent']);
    });
  });
});

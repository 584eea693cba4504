/**
 * Two API server processes on their own ports against one database and one job queue, as two replicas behind a load
 * balancer would run: invoice numbers stay gapless and distinct when both issue at once, each queued job runs once,
 * a refresh token spent on one is refused on the other, and the sign-in rate limit counts both instances' attempts.
 * The fixtures talk to the processes over HTTP; the test reads the database through a connection of its own.
 */
import { addDays } from '@keenroute/shared';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { typeormOptions } from '../src/database/typeorm-options';
import { REMINDER_SEND_QUEUE } from '../src/invoices/reminders/invoice-reminders.service';
import {
  businessToday,
  createCustomer,
  createInvoice,
  createIssuedInvoice,
  createStop,
  createToInvoiceTicket,
  ensureRateCard,
  invoiceActors,
  issueInvoice,
  type CustomerRef,
} from './utils/invoice-fixtures';
import { startApiInstances, stopApiInstances, type ApiInstance } from './utils/instances/api-instances';
import { instanceApp } from './utils/instances/instance-app';
import { jobRows, sendJobs } from './utils/instances/job-queue';
import { mailTo } from './utils/mail-catcher';
import { createUser, refreshCookie, signIn } from './utils/test-app';

const PER_INSTANCE = 10;
const REMINDERS = 4;
/** Low, so the attempts past it come quickly; both instances get the same limit, as replicas of one deploy would. */
const AUTH_RATE_LIMIT = 2;

/** Polls until `check` returns a value, or fails after the timeout: queued jobs run on pg-boss's own schedule. */
async function eventually<T>(what: string, check: () => Promise<T | undefined>, timeoutMs = 45_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await check();
    if (value !== undefined) return value;
    if (Date.now() > deadline) throw new Error(`Timed out waiting for ${what}.`);
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}

const sequenceOf = (number: string) => Number(number.split('-')[2]);
const countBy = (values: readonly string[]) =>
  values.reduce((counts, value) => counts.set(value, (counts.get(value) ?? 0) + 1), new Map<string, number>());

describe('several API instances (e2e, two processes)', () => {
  let instances: ApiInstance[] = [];
  let a: INestApplication<App>;
  let b: INestApplication<App>;
  let db: DataSource;
  let actors: Awaited<ReturnType<typeof invoiceActors>>;
  let stopId: string;
  /** Alternates the instances, as a round-robin load balancer would. */
  const either = (i: number) => (i % 2 === 0 ? a : b);

  beforeAll(async () => {
    db = await new DataSource(typeormOptions(process.env.DATABASE_URL!)).initialize();
    instances = await startApiInstances(['A', 'B'], {
      JOBS_WORKERS: 'on',
      // Info, so the test can read which instance sent each reminder.
      LOG_LEVEL: 'info',
      AUTH_RATE_LIMIT: String(AUTH_RATE_LIMIT),
    });
    [a, b] = instances.map((instance) => instanceApp(instance, db)) as [INestApplication<App>, INestApplication<App>];
    actors = await invoiceActors(a, ['owner', 'office']);
    await ensureRateCard(b, actors.tokens.owner);
    stopId = (await createStop(b, actors.tokens.office, { taxRateBp: 700, name: 'Two Instances Salon (demo)' })).id;
  }, 180_000);

  afterAll(async () => {
    await stopApiInstances(instances);
    await db?.destroy();
  }, 40_000);

  it('keeps invoice numbers gapless and distinct while both instances issue at once', async () => {
    const office = actors.tokens.office;
    const { id: customerId } = await createCustomer(a, office, { stopId });
    const tickets = await Promise.all(
      Array.from({ length: 2 * PER_INSTANCE }, (_, i) => createToInvoiceTicket(either(i), office, { customerId })),
    );
    const drafts = await Promise.all(tickets.map((ticket, i) => createInvoice(either(i), office, [ticket.id])));
    const year = Number(businessToday(a).slice(0, 4));
    const counter = async () =>
      (
        await db.query<{ last_number: number }[]>(
          `SELECT last_number FROM document_counters WHERE series = 'KR' AND year = $1`,
          [year],
        )
      )[0]?.last_number ?? 0;
    const before = await counter();

    // Every issue request at once, half to each instance: they all queue on the one counter row.
    const issued = await Promise.all(drafts.map((draft, i) => issueInvoice(either(i), office, draft.id)));

    const numbers = issued.map((invoice) => invoice.number!);
    for (const number of numbers) expect(number).toMatch(new RegExp(`^KR-${year}-\\d{4,}$`));
    expect(new Set(numbers).size).toBe(2 * PER_INSTANCE);
    expect(numbers.map(sequenceOf).sort((x, y) => x - y)).toEqual(
      Array.from({ length: 2 * PER_INSTANCE }, (_, i) => before + 1 + i),
    );
    // The whole year, every test's invoices included: exactly 1..N, no gap, no number twice, N the counter.
    const yearNumbers = await db.query<{ number: string }[]>(`SELECT number FROM invoices WHERE number LIKE $1`, [
      `KR-${year}-%`,
    ]);
    const last = await counter();
    expect(yearNumbers.map((row) => sequenceOf(row.number)).sort((x, y) => x - y)).toEqual(
      Array.from({ length: last }, (_, i) => i + 1),
    );
  }, 120_000);

  it('runs each queued job once, on whichever instance takes it', async () => {
    const office = actors.tokens.office;
    const today = businessToday(a);
    const owed: { customer: CustomerRef; invoiceId: string }[] = await Promise.all(
      Array.from({ length: REMINDERS }, async (_, i) => {
        const customer = await createCustomer(either(i), office, { stopId });
        const ticket = await createToInvoiceTicket(either(i), office, { customerId: customer.id });
        const invoice = await createIssuedInvoice(either(i + 1), office, [ticket.id]);
        return { customer, invoiceId: invoice.id };
      }),
    );
    const invoiceIds = owed.map((entry) => entry.invoiceId);
    // Test shortcut: each invoice 10 days past due with its 7-day reminder owed, as the daily run would stage it.
    await db.query(`UPDATE invoices SET due_date = $2::date WHERE id = ANY($1::uuid[])`, [
      invoiceIds,
      addDays(today, -10),
    ]);
    const reminderIds = (
      await db.query<{ id: string }[]>(
        `INSERT INTO invoice_reminders (invoice_id, stage_days, status)
         SELECT invoice_id, 7, 'pending' FROM unnest($1::uuid[]) AS invoice_id RETURNING id`,
        [invoiceIds],
      )
    ).map((row) => row.id);

    const jobIds = await sendJobs(
      process.env.DATABASE_URL!,
      REMINDER_SEND_QUEUE,
      reminderIds.map((reminderId) => ({ reminderId })),
    );
    const jobs = await eventually('every reminder job to finish', async () => {
      const rows = await jobRows(db, jobIds);
      return rows.length === REMINDERS && rows.every((row) => row.state === 'completed') ? rows : undefined;
    });
    expect(jobs.map((job) => job.retryCount)).toEqual(Array.from({ length: REMINDERS }, () => 0));

    const reminders = await db.query<{ status: string; attempts: number }[]>(
      `SELECT status, attempts FROM invoice_reminders WHERE id = ANY($1::uuid[])`,
      [reminderIds],
    );
    expect(reminders).toEqual(Array.from({ length: REMINDERS }, () => ({ status: 'sent', attempts: 1 })));
    const logged = await db.query<{ invoice_id: string }[]>(
      `SELECT invoice_id FROM invoice_mails WHERE kind = 'reminder' AND invoice_id = ANY($1::uuid[])`,
      [invoiceIds],
    );
    expect([...countBy(logged.map((row) => row.invoice_id)).values()]).toEqual(
      Array.from({ length: REMINDERS }, () => 1),
    );
    for (const { customer } of owed) {
      const reminderMails = (await mailTo(customer.email!)).filter((mail) => /^Reminder:/.test(mail.subject));
      expect(reminderMails).toHaveLength(1);
    }

    // Who sent what: every reminder by exactly one instance, and both instances' workers took some.
    const sentBy = instances.map((instance) =>
      instance
        .logs('invoice reminder sent')
        .map((line) => line.reminderId as string)
        .filter((id) => reminderIds.includes(id)),
    );
    expect(sentBy.flat().sort()).toEqual([...reminderIds].sort());
    for (const sent of sentBy) expect(sent.length).toBeGreaterThan(0);
  }, 120_000);

  it('refuses on one instance a refresh token rotated on the other', async () => {
    const user = await createUser(a, 'office');
    const http = (app: INestApplication<App>) => request(app.getHttpServer());
    const refresh = (app: INestApplication<App>, cookie: string) =>
      http(app).post('/api/auth/refresh').set('Cookie', cookie);

    const first = await signIn(a, user.email);
    // The access token signed on A is good on B: nothing about a session lives in one process.
    await http(b).get('/api/auth/me').set('Authorization', `Bearer ${first.token}`).expect(200);

    const rotatedOnA = refreshCookie(await refresh(a, first.cookie).expect(200));
    const rotatedOnB = refreshCookie(await refresh(b, rotatedOnA).expect(200));

    const replayed = await refresh(b, first.cookie).expect(401);
    expect(replayed.body.message).toMatch(/session has ended/i);
    // A spent token coming back means a copy: the whole family ends, on A as well.
    await refresh(a, rotatedOnB).expect(401);
  });

  it('counts sign-in attempts on both instances against one limit', async () => {
    const login = (app: INestApplication<App>, email: string) =>
      request(app.getHttpServer()).post('/api/auth/login').send({ email, password: 'guess-guess-guess' });

    const email = `two-instances-${Date.now()}@e2e.keenroute.test`;
    const statuses: number[] = [];
    for (let attempt = 0; attempt < AUTH_RATE_LIMIT; attempt += 1) {
      statuses.push((await login(either(attempt), email)).status);
    }
    expect(statuses).toEqual(Array.from({ length: AUTH_RATE_LIMIT }, () => 401));
    expect((await login(a, email).expect(429)).body.message).toMatch(/Too many attempts/);
    await login(b, email).expect(429);
    // Behind the balancer (here on loopback, which TRUST_PROXY trusts by default) each client counts on its own.
    await login(b, email).set('X-Forwarded-For', '203.0.113.7').expect(401);

    // All at once, half to each: the shared counter lets exactly the limit through.
    const burst = `two-instances-burst-${Date.now()}@e2e.keenroute.test`;
    const answers = await Promise.all(
      Array.from({ length: 2 * AUTH_RATE_LIMIT }, (_, i) =>
        login(either(i), burst).then((response) => response.status),
      ),
    );
    expect(answers.filter((status) => status === 401)).toHaveLength(AUTH_RATE_LIMIT);
    expect(answers.filter((status) => status === 429)).toHaveLength(AUTH_RATE_LIMIT);
  }, 60_000);
});

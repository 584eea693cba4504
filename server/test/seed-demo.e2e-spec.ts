/** The demo seed (invented Larkhaven data) loaded into a throwaway database: counts, mix, dates and idempotence. */
import 'reflect-metadata';
import {
  addDays,
  EDGE_TYPES,
  TOOL_KINDS,
  validateCadence,
  validateOpeningHours,
  type Weekday,
  WEEKDAYS,
  weekdayOf,
  weekStart,
} from '@keenroute/shared';
import { randomBytes } from 'node:crypto';
import { DataSource } from 'typeorm';
import { DEMO_ADDRESSES } from '../src/database/seeds/demo-city';
import { buildDemoRegistry } from '../src/database/seeds/demo-registry';
import { DEMO_EMAILS } from '../src/database/seeds/demo-users';
import { seedDemo } from '../src/database/seeds/seed-demo';
import { typeormOptions } from '../src/database/typeorm-options';
import { Stop } from '../src/stops/entities/stop.entity';
import { StopVisit } from '../src/stops/entities/stop-visit.entity';

// The e2e database is shared by every e2e file, so the seed runs in a throwaway database of its own.
describe('demo seed (e2e)', () => {
  const databaseName = `seed_check_${randomBytes(5).toString('hex')}`;
  const today = new Date().toISOString().slice(0, 10);
  let admin: DataSource;
  let db: DataSource;
  let firstRun: boolean;
  let secondRun: boolean;
  const people = { ownerId: '', sharpenerId: '', clientId: '', shopManagerId: '' };

  const one = async <T>(sql: string, params: unknown[] = []): Promise<T> => (await db.query<T[]>(sql, params))[0]!;
  const num = async (sql: string, params: unknown[] = []) => Number((await one<{ n: string }>(sql, params)).n);
  const tableCounts = () =>
    db.query(`SELECT
      (SELECT count(*) FROM users) AS users, (SELECT count(*) FROM rate_cards) AS rates,
      (SELECT count(*) FROM stops) AS stops, (SELECT count(*) FROM stop_visits) AS visits,
      (SELECT count(*) FROM customers) AS customers, (SELECT count(*) FROM customer_stop_history) AS history,
      (SELECT count(*) FROM shears) AS shears, (SELECT count(*) FROM shear_history) AS shear_history,
      (SELECT last_value FROM shear_tag_serial) AS tag_serial, (SELECT count(*) FROM planning_settings) AS planning`);
  const userId = async (email: string) =>
    (await one<{ id: string }>(`SELECT id FROM users WHERE email = $1`, [email])).id;

  beforeAll(async () => {
    admin = await new DataSource({ type: 'postgres', url: process.env.DATABASE_URL }).initialize();
    await admin.query(`CREATE DATABASE "${databaseName}"`);
    const url = new URL(process.env.DATABASE_URL!);
    url.pathname = `/${databaseName}`;
    db = await new DataSource(typeormOptions(url.toString())).initialize();
    await db.runMigrations({ transaction: 'each' });
    firstRun = await seedDemo(db);
    const afterFirst = await tableCounts();
    secondRun = await seedDemo(db);
    expect(await tableCounts()).toEqual(afterFirst);
    people.ownerId = await userId(DEMO_EMAILS.owner);
    people.sharpenerId = await userId(DEMO_EMAILS.sharpener);
    people.clientId = await userId(DEMO_EMAILS.client);
    people.shopManagerId = await userId(DEMO_EMAILS.shopManager);
  }, 90_000);

  afterAll(async () => {
    await db?.destroy();
    await admin?.query(`DROP DATABASE IF EXISTS "${databaseName}" WITH (FORCE)`);
    await admin?.destroy();
  });

  it('seeds once: the second run answers false and changes nothing', () => {
    expect(firstRun).toBe(true);
    expect(secondRun).toBe(false);
  });

  it('fills in the invented business profile for the invoices once, and leaves an owner’s own name alone', async () => {
    const profile = await one<{ name: string; email: string; payment_terms_days: number }>(
      `SELECT name, email, payment_terms_days FROM business_profile WHERE id = 1`,
    );
    expect(profile).toEqual({
      name: 'Larkhaven Shear Route (demo)',
      email: 'billing@demo.keenroute.test',
      payment_terms_days: 14,
    });
    await db.query(`UPDATE business_profile SET name = 'Our own shop' WHERE id = 1`);
    await seedDemo(db);
    expect((await one<{ name: string }>(`SELECT name FROM business_profile WHERE id = 1`)).name).toBe('Our own shop');
  });

  it('gives the same registry for the same day every time (seeded, not random)', () => {
    const counter = () => {
      let n = 0;
      return () => `id-${++n}`;
    };
    const first = buildDemoRegistry(today, people, counter());
    expect(buildDemoRegistry(today, people, counter())).toEqual(first);
  });

  it('stores exactly the built registry, with tags in registration order', async () => {
    const built = buildDemoRegistry(today, people);
    const stored: { make: string; model: string; length_in: string; edge_type: string }[] = await db.query(
      `SELECT make, model, length_in, edge_type FROM shears ORDER BY tag_code`,
    );
    expect(stored.map((s) => [s.make, s.model, Number(s.length_in), s.edge_type])).toEqual(
      built.shears.map((s) => [s.make, s.model, s.lengthIn, s.edgeType]),
    );
    const names: { name: string }[] = await db.query(`SELECT name FROM stops ORDER BY name`);
    expect(names.map((s) => s.name)).toEqual(built.stops.map((s) => s.name).sort((a, b) => (a < b ? -1 : 1)));
  });

  it('has about 40 stops, 300 customers and 900 shears', async () => {
    expect(await num(`SELECT count(*) AS n FROM stops`)).toBeGreaterThanOrEqual(35);
    expect(await num(`SELECT count(*) AS n FROM stops`)).toBeLessThanOrEqual(45);
    expect(await num(`SELECT count(*) AS n FROM customers`)).toBeGreaterThanOrEqual(250);
    expect(await num(`SELECT count(*) AS n FROM customers`)).toBeLessThanOrEqual(350);
    expect(await num(`SELECT count(*) AS n FROM shears`)).toBeGreaterThanOrEqual(800);
    expect(await num(`SELECT count(*) AS n FROM shears`)).toBeLessThanOrEqual(1000);
  });

  it('places every stop on a demo address, found, with fictional phones and demo e-mails', async () => {
    const stops: {
      kind: string;
      street: string;
      latitude: number;
      longitude: number;
      geocode_status: string;
      phone: string;
      email: string | null;
      assigned_sharpener_id: string;
      active: boolean;
    }[] = await db.query(`SELECT * FROM stops`);
    for (const stop of stops) {
      const address = DEMO_ADDRESSES.find((a) => a.street === stop.street);
      expect(address).toBeDefined();
      expect([stop.latitude, stop.longitude, stop.geocode_status]).toEqual([
        address!.latitude,
        address!.longitude,
        'found',
      ]);
      expect(stop.phone).toMatch(/555-01\d\d$/);
      if (stop.email !== null) expect(stop.email).toMatch(/^[a-z]+@[a-z0-9-]+\.demo\.keenroute\.test$/);
    }
    const kinds = (kind: string) => stops.filter((s) => s.kind === kind).length;
    expect([kinds('salon'), kinds('barbershop'), kinds('grooming-shop'), kinds('school')]).toEqual([20, 6, 10, 2]);
    const byTomas = stops.filter((s) => s.assigned_sharpener_id === people.sharpenerId).length;
    const byDana = stops.filter((s) => s.assigned_sharpener_id === people.ownerId).length;
    expect(byTomas).toBeGreaterThan(stops.length / 2);
    expect(byDana).toBeGreaterThan(0);
    expect(byTomas + byDana).toBe(stops.length);
    expect(stops.filter((s) => !s.active).length).toBeGreaterThanOrEqual(1);
    expect(stops.filter((s) => !s.active).length).toBeLessThanOrEqual(2);
  });

  it('gives stops believable hours, cadences, billing and access notes', async () => {
    const stops = await db.getRepository(Stop).find();
    const visits = await db.getRepository(StopVisit).find();
    // Read as text: node-postgres turns a date[] into Date objects (TypeORM maps only plain date columns to strings).
    const closed: { id: string; dates: string[] }[] = await db.query(
      `SELECT id, array(SELECT to_char(d, 'YYYY-MM-DD') FROM unnest(closed_dates) d) AS dates FROM stops`,
    );
    for (const stop of stops) {
      expect(validateOpeningHours(stop.openingHours)).toEqual(stop.openingHours);
      expect(validateCadence(stop.cadenceWeeks)).toBe(stop.cadenceWeeks);
      expect(closed.find((row) => row.id === stop.id)!.dates.every((date) => date > today)).toBe(true);
      const worked = visits.filter((visit) => visit.stopId === stop.id);
      expect(worked.every((visit) => (stop.openingHours[weekdayOf(visit.workedOn)]?.length ?? 0) > 0)).toBe(true);
    }
    const closedOn = (day: Weekday) => stops.filter((s) => !s.openingHours[day]).length;
    expect(closedOn('sun')).toBeGreaterThanOrEqual(stops.length - 2);
    expect(closedOn('mon')).toBeGreaterThan(stops.length / 3);
    expect(stops.some((s) => Object.values(s.openingHours).some((windows) => windows.length === 2))).toBe(true);
    const grooming = stops.filter((s) => s.kind === 'grooming-shop');
    expect(grooming.every((s) => WEEKDAYS.some((day) => (s.openingHours[day]?.[0]?.opens ?? '99') <= '07:30'))).toBe(
      true,
    );
    expect(grooming.every((s) => s.cadenceWeeks >= 4 && s.cadenceWeeks <= 6)).toBe(true);
    const salons = stops.filter((s) => s.kind === 'salon');
    expect(salons.every((s) => s.cadenceWeeks >= 6 && s.cadenceWeeks <= 10)).toBe(true);
    expect(new Set(salons.map((s) => s.cadenceWeeks)).size).toBeGreaterThan(1);
    expect(stops.filter((s) => s.kind === 'school').every((s) => s.billingMode === 'stop')).toBe(true);
    expect(stops.filter((s) => s.billingMode === 'customer').length).toBeGreaterThan(stops.length / 2);
    expect(closed.filter((row) => row.dates.length > 0).length).toBeGreaterThan(0);
    expect(stops.filter((s) => s.preferredWeekdays.length > 0).length).toBeGreaterThan(0);
    expect(stops.filter((s) => s.accessParking !== '').length).toBeGreaterThan(stops.length / 2);
  });

  it('makes coming-due interesting today: overdue, due this week and next, later, and one never visited', async () => {
    const due: { next_due: string | null; last_visit: string | null }[] = await db.query(
      `SELECT to_char(max(v.worked_on) + s.cadence_weeks * 7, 'YYYY-MM-DD') AS next_due,
              to_char(max(v.worked_on), 'YYYY-MM-DD') AS last_visit
       FROM stops s LEFT JOIN stop_visits v ON v.stop_id = s.id WHERE s.active GROUP BY s.id`,
    );
    const monday = weekStart(today);
    const dates = due.flatMap((d) => (d.next_due ? [d.next_due] : []));
    expect(due.filter((d) => d.last_visit === null)).toHaveLength(1);
    expect(due.every((d) => d.last_visit === null || d.last_visit < today)).toBe(true);
    const overdue = dates.filter((d) => d <= addDays(today, -7) && d >= addDays(today, -21));
    expect(overdue.length).toBeGreaterThanOrEqual(2);
    expect(overdue.length).toBeLessThanOrEqual(6);
    expect(dates.filter((d) => d >= monday && d <= addDays(monday, 6)).length).toBeGreaterThanOrEqual(3);
    expect(dates.filter((d) => d > addDays(monday, 6) && d <= addDays(monday, 13)).length).toBeGreaterThanOrEqual(3);
    expect(dates.filter((d) => d > addDays(monday, 13)).length).toBeGreaterThan(due.length / 3);
  });

  it('gives every tag code the KR-000000 form, once, with the sequence past the last one', async () => {
    const tags: { tag_code: string }[] = await db.query(`SELECT tag_code FROM shears ORDER BY tag_code`);
    expect(tags.every((t) => /^KR-\d{6}$/.test(t.tag_code))).toBe(true);
    expect(new Set(tags.map((t) => t.tag_code)).size).toBe(tags.length);
    expect(tags[0]!.tag_code).toBe('KR-000001');
    const last = Number(tags[tags.length - 1]!.tag_code.slice(3));
    expect(await num(`SELECT last_value AS n FROM shear_tag_serial`)).toBeGreaterThanOrEqual(last);
  });

  it('mixes shears believably: about 8% left-handed, every edge type and tool kind, chunkers only for grooming', async () => {
    const shears: { edge_type: string; tool_kind: string; handedness: string; use: string; kind: string }[] =
      await db.query(
        `SELECT sh.edge_type, sh.tool_kind, sh.handedness, sh.use, st.kind
         FROM shears sh JOIN customers c ON c.id = sh.customer_id JOIN stops st ON st.id = c.stop_id`,
      );
    const left = shears.filter((s) => s.handedness === 'left').length / shears.length;
    expect(left).toBeGreaterThanOrEqual(0.05);
    expect(left).toBeLessThanOrEqual(0.12);
    expect(new Set(shears.map((s) => s.edge_type))).toEqual(new Set(EDGE_TYPES));
    expect(new Set(shears.map((s) => s.tool_kind))).toEqual(new Set(TOOL_KINDS));
    expect(shears.filter((s) => s.kind === 'grooming-shop').every((s) => s.use === 'grooming')).toBe(true);
    expect(shears.filter((s) => s.kind === 'salon' || s.kind === 'barbershop').every((s) => s.use === 'hair')).toBe(
      true,
    );
    expect(shears.filter((s) => s.tool_kind === 'chunker').every((s) => s.use === 'grooming')).toBe(true);
    expect(
      await num(`SELECT count(*) AS n FROM (SELECT customer_id FROM shears WHERE handedness = 'left'
                 GROUP BY customer_id HAVING count(*) >= 2) pairs`),
    ).toBeGreaterThan(0);
    expect(await num(`SELECT count(*) AS n FROM shears WHERE status <> 'in-service'`)).toBeGreaterThan(0);
  });

  it('writes shear history: registered for each, serviced on stop visit dates, a status line when not in service', async () => {
    expect(
      await num(`SELECT count(*) AS n FROM shears s
                 WHERE (SELECT count(*) FROM shear_history h WHERE h.shear_id = s.id AND h.kind = 'registered') <> 1`),
    ).toBe(0);
    expect(
      await num(`SELECT count(*) AS n FROM shears s WHERE s.status <> 'in-service'
                 AND NOT EXISTS (SELECT 1 FROM shear_history h WHERE h.shear_id = s.id AND h.kind = 'status')`),
    ).toBe(0);
    expect(await num(`SELECT count(*) AS n FROM shear_history WHERE kind = 'serviced'`)).toBeGreaterThan(800);
    // Each serviced line falls on a worked visit of a stop the owner was at.
    expect(
      await num(`SELECT count(*) AS n FROM shear_history h JOIN shears s ON s.id = h.shear_id
                 WHERE h.kind = 'serviced' AND NOT EXISTS (
                   SELECT 1 FROM customer_stop_history csh JOIN stop_visits v ON v.stop_id = csh.stop_id
                   WHERE csh.customer_id = s.customer_id AND v.worked_on = h.happened_on)`),
    ).toBe(0);
    expect(await num(`SELECT count(*) AS n FROM shear_history WHERE happened_on > $1`, [today])).toBe(0);
  });

  it('opens one stop history row per customer, with a few who moved, and links Jo Marlow', async () => {
    expect(
      await num(`SELECT count(*) AS n FROM customers c WHERE (SELECT count(*) FROM customer_stop_history h
                 WHERE h.customer_id = c.id AND h.ended_at IS NULL AND h.stop_id = c.stop_id) <> 1`),
    ).toBe(0);
    const moved = await num(
      `SELECT count(DISTINCT customer_id) AS n FROM customer_stop_history WHERE ended_at IS NOT NULL`,
    );
    expect(moved).toBeGreaterThanOrEqual(3);
    expect(moved).toBeLessThanOrEqual(5);
    expect(await num(`SELECT count(*) AS n FROM customers WHERE user_id = $1`, [people.clientId])).toBe(1);
    const managed = await one<{ kind: string }>(`SELECT kind FROM stops WHERE manager_user_id = $1`, [
      people.shopManagerId,
    ]);
    expect(managed.kind).toBe('grooming-shop');
    const emails: { email: string }[] = await db.query(`SELECT email FROM customers WHERE email IS NOT NULL`);
    expect(emails.every((c) => c.email.endsWith('@demo.keenroute.test'))).toBe(true);
    expect(await num(`SELECT count(*) AS n FROM customers WHERE email IS NULL`)).toBeGreaterThan(0);
  });

  it('re-seeds the registry when the users are there but the stops are not, fast, and continues the tags', async () => {
    // The visit history goes first: its tickets and invoices hold on to the customers, shears and stops (and the
    // shears' history first of all, or every ticket deleted would look through it for lines to unlink).
    await db.query(`DELETE FROM shear_history; DELETE FROM invoice_reminders; DELETE FROM payments; DELETE FROM credit_notes;
                    DELETE FROM invoice_lines; DELETE FROM ticket_line_overrides; DELETE FROM ticket_lines;
                    DELETE FROM tickets; DELETE FROM invoices; DELETE FROM document_counters;
                    DELETE FROM route_day_stops; DELETE FROM route_days`);
    await db.query(`DELETE FROM shears; DELETE FROM customer_stop_history;
                    DELETE FROM customers; DELETE FROM stop_visits; DELETE FROM stops`);
    const users = await num(`SELECT count(*) AS n FROM users`);
    const started = Date.now();
    expect(await seedDemo(db)).toBe(true);
    // Bulk inserts take well under a second on an idle machine; row-by-row inserts would blow this loose bound.
    expect(Date.now() - started).toBeLessThan(10_000);
    expect(await num(`SELECT count(*) AS n FROM users`)).toBe(users);
    const shears = await num(`SELECT count(*) AS n FROM shears`);
    expect(await one<{ tag_code: string }>(`SELECT min(tag_code) AS tag_code FROM shears`)).toEqual({
      tag_code: `KR-${String(shears + 1).padStart(6, '0')}`,
    });
    expect(await seedDemo(db)).toBe(false);
  });
});

/**
 * The demo seed's invented past (seeds/history) in a throwaway database: two years of visits at each stop's cadence,
 * route days whose drive is the travel model's, tickets at the rules' prices, every ticket settled or invoiced,
 * invoices priced and numbered as the app does, and receivables of every age. Figures are worked out here again.
 */
import 'reflect-metadata';
import { addDays, benchMinutes, daysBetween, DEMO_RATE_CARD, priceTicket, type AddOnCode } from '@keenroute/shared';
import { randomBytes } from 'node:crypto';
import { DataSource } from 'typeorm';
import { buildDemoRegistry } from '../src/database/seeds/demo-registry';
import { DEMO_EMAILS } from '../src/database/seeds/demo-users';
import { seedDemo } from '../src/database/seeds/seed-demo';
import { typeormOptions } from '../src/database/typeorm-options';

const TIME_ZONE = 'America/Chicago';

/** Great-circle km (haversine, mean Earth radius 6371.0088 km), written out here rather than imported. */
function haversineKm(a: { lat: number; lon: number }, b: { lat: number; lon: number }): number {
  const rad = Math.PI / 180;
  const h =
    Math.sin(((b.lat - a.lat) * rad) / 2) ** 2 +
    Math.cos(a.lat * rad) * Math.cos(b.lat * rad) * Math.sin(((b.lon - a.lon) * rad) / 2) ** 2;
  return 2 * 6371.0088 * Math.asin(Math.min(1, Math.sqrt(h)));
}

function groupBy<T, K>(items: readonly T[], key: (item: T) => K): Map<K, T[]> {
  const groups = new Map<K, T[]>();
  for (const item of items) groups.set(key(item), [...(groups.get(key(item)) ?? []), item]);
  return groups;
}

/** Half-up to the cent: cents × bp / 10,000. */
const taxOf = (cents: number, bp: number) => Math.floor((cents * bp + 5000) / 10000);

describe('demo history (e2e)', () => {
  const databaseName = `history_check_${randomBytes(5).toString('hex')}`;
  const today = new Date().toISOString().slice(0, 10);
  let admin: DataSource;
  let db: DataSource;
  let seedMs = 0;

  const rows = <T>(sql: string, params: unknown[] = []) => db.query<T[]>(sql, params);
  const num = async (sql: string, params: unknown[] = []) => Number((await rows<{ n: string }>(sql, params))[0]!.n);

  beforeAll(async () => {
    admin = await new DataSource({ type: 'postgres', url: process.env.DATABASE_URL }).initialize();
    await admin.query(`CREATE DATABASE "${databaseName}"`);
    const url = new URL(process.env.DATABASE_URL!);
    url.pathname = `/${databaseName}`;
    db = await new DataSource(typeormOptions(url.toString())).initialize();
    await db.runMigrations({ transaction: 'each' });
    const started = Date.now();
    await seedDemo(db, { today, timeZone: TIME_ZONE });
    seedMs = Date.now() - started;
  }, 120_000);

  afterAll(async () => {
    await db?.destroy();
    await admin?.query(`DROP DATABASE IF EXISTS "${databaseName}" WITH (FORCE)`);
    await admin?.destroy();
  });

  it('seeds the registry and its two years of history in well under half a minute', () => {
    expect(seedMs).toBeLessThan(30_000);
  });

  it('goes back two years and ends before today, leaving each stop’s last visit (what the planner reads) alone', async () => {
    const [span] = await rows<{ first: string; last: string }>(
      `SELECT to_char(min(visit_day), 'YYYY-MM-DD') AS first, to_char(max(visit_day), 'YYYY-MM-DD') AS last FROM tickets`,
    );
    expect(span!.last < today).toBe(true);
    expect(daysBetween(span!.first, today)).toBeGreaterThanOrEqual(700);
    expect(daysBetween(span!.first, today)).toBeLessThanOrEqual(740);

    const ids = Object.fromEntries(
      await Promise.all(
        Object.entries(DEMO_EMAILS).map(async ([key, email]) => [
          key,
          (await rows<{ id: string }>(`SELECT id FROM users WHERE email = $1`, [email]))[0]!.id,
        ]),
      ),
    ) as Record<keyof typeof DEMO_EMAILS, string>;
    const built = buildDemoRegistry(today, {
      ownerId: ids.owner,
      sharpenerId: ids.sharpener,
      clientId: ids.client,
      shopManagerId: ids.shopManager,
    });
    const lastBuilt = new Map<string, string>();
    for (const visit of built.visits) {
      const name = built.stops.find((stop) => stop.id === visit.stopId)!.name;
      if ((lastBuilt.get(name) ?? '') < visit.workedOn) lastBuilt.set(name, visit.workedOn);
    }
    const stored = await rows<{ name: string; last: string | null }>(
      `SELECT s.name, to_char(max(v.worked_on), 'YYYY-MM-DD') AS last
         FROM stops s LEFT JOIN stop_visits v ON v.stop_id = s.id GROUP BY s.name`,
    );
    expect(new Map(stored.filter((s) => s.last !== null).map((s) => [s.name, s.last]))).toEqual(lastBuilt);
    expect(stored.filter((s) => s.last === null)).toHaveLength(1);
  });

  it('visits each stop at its cadence, a few days either way, with some visits one to three weeks late', async () => {
    const visits = await rows<{ stop_id: string; day: string; cadence: number }>(
      `SELECT v.stop_id, to_char(v.worked_on, 'YYYY-MM-DD') AS day, s.cadence_weeks AS cadence
         FROM stop_visits v JOIN stops s ON s.id = v.stop_id ORDER BY v.stop_id, v.worked_on`,
    );
    const beyond: number[] = [];
    for (let i = 1; i < visits.length; i++) {
      const [before, after] = [visits[i - 1]!, visits[i]!];
      if (before.stop_id !== after.stop_id) continue;
      beyond.push(daysBetween(before.day, after.day) - after.cadence * 7);
    }
    const late = beyond.filter((days) => days > 7);
    expect(beyond.length).toBeGreaterThan(400);
    expect(beyond.every((days) => days >= -10 && days <= 32)).toBe(true);
    expect(late.length).toBeGreaterThan(beyond.length * 0.03);
    expect(late.length).toBeLessThan(beyond.length * 0.2);
    expect(beyond.filter((days) => Math.abs(days) <= 7).length).toBeGreaterThan(beyond.length * 0.75);
  });

  it('leaves every ticket handed back and settled: paid on site, or on an invoice (nothing waits to be invoiced)', async () => {
    expect(await num(`SELECT count(*) AS n FROM tickets`)).toBeGreaterThan(2000);
    expect(
      await num(`SELECT count(*) AS n FROM tickets WHERE kind <> 'visit' OR status <> 'handed-back'
                   OR finished_at IS NULL OR handed_back_at < finished_at OR route_day_id IS NULL`),
    ).toBe(0);
    expect(
      await num(`SELECT count(*) AS n FROM tickets t WHERE t.settlement = 'unpaid'
                   OR (t.settlement = 'to-invoice' AND NOT EXISTS (
                        SELECT 1 FROM invoices i WHERE i.id = t.invoice_id AND i.status <> 'void'))`),
    ).toBe(0);
    const share = await num(
      `SELECT round(100.0 * count(*) FILTER (WHERE settlement = 'paid-on-site') / count(*)) AS n FROM tickets`,
    );
    expect(share).toBeGreaterThan(50);
    // Each ticket sits on its stop's route day that day, worked by that day's sharpener, with its visit recorded.
    expect(
      await num(`SELECT count(*) AS n FROM tickets t JOIN route_days rd ON rd.id = t.route_day_id
                  WHERE rd.day <> t.visit_day OR rd.sharpener_id <> t.opened_by
                     OR NOT EXISTS (SELECT 1 FROM route_day_stops x WHERE x.route_day_id = rd.id AND x.stop_id = t.stop_id)
                     OR NOT EXISTS (SELECT 1 FROM stop_visits v WHERE v.stop_id = t.stop_id AND v.worked_on = t.visit_day)`),
    ).toBe(0);
    expect(
      await num(`SELECT count(*) AS n FROM (SELECT 1 FROM tickets GROUP BY stop_id, visit_day
                                             HAVING count(*) FILTER (WHERE charge_trip) <> 1) x`),
    ).toBe(0);
  });

  it('prices every ticket by the demo rate card, a price set by hand moving the subtotal by its difference', async () => {
    const lines = await rows<{
      ticket_id: string;
      edge_type: 'convex';
      tool_kind: 'straight';
      length_in: number;
      handedness: 'right';
      use: 'hair';
      add_ons: AddOnCode[];
      price_cents: number;
      override_cents: number | null;
    }>(
      `SELECT l.ticket_id, s.edge_type, s.tool_kind, s.length_in::float8 AS length_in, s.handedness, s.use,
              l.add_ons, l.price_cents, l.override_cents
         FROM ticket_lines l JOIN shears s ON s.id = l.shear_id ORDER BY l.ticket_id, l.position`,
    );
    const tickets = await rows<{
      id: string;
      tax_rate_bp: number;
      charge_trip: boolean;
      rules_subtotal_cents: number;
      subtotal_cents: number;
      tax_cents: number;
      total_cents: number;
    }>(
      `SELECT id, tax_rate_bp, charge_trip, rules_subtotal_cents, subtotal_cents, tax_cents, total_cents FROM tickets`,
    );
    const byTicket = groupBy(lines, (line) => line.ticket_id);
    let overridden = 0;
    for (const ticket of tickets) {
      const own = byTicket.get(ticket.id)!;
      const price = priceTicket(
        own.map((line) => ({
          shear: {
            edgeType: line.edge_type,
            toolKind: line.tool_kind,
            lengthIn: line.length_in,
            handedness: line.handedness,
            use: line.use,
          },
          addOns: line.add_ons,
        })),
        DEMO_RATE_CARD,
        { taxRateBp: ticket.tax_rate_bp, chargeTrip: ticket.charge_trip },
      );
      expect(own.map((line) => line.price_cents)).toEqual(price.lines.map((line) => line.totalCents));
      expect(ticket.rules_subtotal_cents).toBe(price.subtotalCents);
      const moved = own.reduce((sum, line) => sum + (line.override_cents ?? line.price_cents) - line.price_cents, 0);
      if (own.some((line) => line.override_cents !== null)) overridden++;
      const subtotal = Math.max(0, price.subtotalCents + moved);
      expect([ticket.subtotal_cents, ticket.tax_cents, ticket.total_cents]).toEqual([
        subtotal,
        taxOf(subtotal, ticket.tax_rate_bp),
        subtotal + taxOf(subtotal, ticket.tax_rate_bp),
      ]);
    }
    expect(overridden).toBeGreaterThan(0);
    expect(await num(`SELECT count(*) AS n FROM ticket_line_overrides`)).toBe(
      await num(`SELECT count(*) AS n FROM ticket_lines WHERE override_cents IS NOT NULL`),
    );
  });

  it('times route days by the travel model, nearest stop next, the drive home counted in the day’s totals', async () => {
    const [settings] = await rows<{ lat: number; lon: number; circuity: string; speed: number }>(
      `SELECT base_latitude AS lat, base_longitude AS lon, circuity, average_speed_kmh AS speed FROM planning_settings`,
    );
    const circuity = Number(settings!.circuity);
    const stops = await rows<{
      route_day_id: string;
      position: number;
      lat: number;
      lon: number;
      km_before: number;
      drive_minutes_before: number;
      bench_minutes: number;
      arrival: number;
      start: number;
      leave: number;
    }>(
      `SELECT x.route_day_id, x.position, s.latitude AS lat, s.longitude AS lon, x.km_before, x.drive_minutes_before,
              x.bench_minutes, x.arrival, x.start, x.leave
         FROM route_day_stops x JOIN stops s ON s.id = x.stop_id ORDER BY x.route_day_id, x.position`,
    );
    const days = await rows<{ id: string; distance_km: number; drive_minutes: number; bench_minutes: number }>(
      `SELECT id, distance_km, drive_minutes, bench_minutes FROM route_days`,
    );
    const byDay = groupBy(stops, (stop) => stop.route_day_id);
    const base = { lat: settings!.lat, lon: settings!.lon };
    const road = (a: typeof base, b: typeof base) => haversineKm(a, b) * circuity;
    for (const day of days) {
      const own = byDay.get(day.id)!;
      let at = base;
      let km = 0;
      own.forEach((stop, i) => {
        const here = { lat: stop.lat, lon: stop.lon };
        expect(stop.km_before).toBeCloseTo(road(at, here), 6);
        expect(stop.drive_minutes_before).toBe(Math.round((road(at, here) / settings!.speed) * 60));
        // Nearest neighbour: no stop later in the day was closer to where the sharpener stood.
        for (const later of own.slice(i + 1)) expect(road(at, later)).toBeGreaterThanOrEqual(road(at, here) - 1e-9);
        expect(stop.arrival <= stop.start && stop.start + stop.bench_minutes === stop.leave).toBe(true);
        km += road(at, here);
        at = here;
      });
      km += road(at, base);
      expect(day.distance_km).toBeCloseTo(km, 6);
      expect(day.drive_minutes).toBe(Math.round((km / settings!.speed) * 60));
      expect(day.bench_minutes).toBe(own.reduce((sum, stop) => sum + stop.bench_minutes, 0));
    }
    // A stop's bench minutes: the setup and each pair worked there that day, by the rules' bench times.
    const pairs = await rows<{
      route_day_id: string;
      stop_id: string;
      edge_type: 'convex';
      tool_kind: 'straight';
      honed: boolean;
    }>(
      `SELECT t.route_day_id, t.stop_id, s.edge_type, s.tool_kind, 'inside-edge-hone' = ANY(l.add_ons) AS honed
         FROM tickets t JOIN ticket_lines l ON l.ticket_id = t.id JOIN shears s ON s.id = l.shear_id`,
    );
    const bench = await rows<{ route_day_id: string; stop_id: string; bench_minutes: number }>(
      `SELECT route_day_id, stop_id, bench_minutes FROM route_day_stops`,
    );
    const worked = groupBy(pairs, (pair) => `${pair.route_day_id}|${pair.stop_id}`);
    for (const stop of bench) {
      const own = worked.get(`${stop.route_day_id}|${stop.stop_id}`) ?? [];
      expect(stop.bench_minutes).toBe(
        benchMinutes(own.map((p) => ({ edgeType: p.edge_type, toolKind: p.tool_kind, insideEdge: p.honed }))),
      );
    }
  });

  it('invoices per payer, each priced from its lines (tax once per rate, half-up) and numbered without gaps per year', async () => {
    const invoices = await rows<{
      id: string;
      number: string;
      issue_date: string;
      due_date: string;
      status: string;
      bill_to: string;
      lines_cents: number;
      subtotal_cents: number;
      tax_cents: number;
      total_cents: number;
    }>(
      `SELECT id, number, to_char(issue_date, 'YYYY-MM-DD') AS issue_date, to_char(due_date, 'YYYY-MM-DD') AS due_date,
              status, bill_to, lines_cents, subtotal_cents, tax_cents, total_cents FROM invoices ORDER BY number`,
    );
    const lines = await rows<{ invoice_id: string; amount_cents: number; taxable: boolean; tax_rate_bp: number }>(
      `SELECT invoice_id, amount_cents, taxable, tax_rate_bp FROM invoice_lines`,
    );
    const byInvoice = groupBy(lines, (line) => line.invoice_id);
    for (const invoice of invoices) {
      const own = byInvoice.get(invoice.id)!;
      const linesCents = own.reduce((sum, line) => sum + line.amount_cents, 0);
      const rates = groupBy(
        own.filter((line) => line.taxable),
        (line) => line.tax_rate_bp,
      );
      const tax = [...rates].reduce(
        (sum, [rate, group]) =>
          sum +
          taxOf(
            group.reduce((s, line) => s + line.amount_cents, 0),
            rate,
          ),
        0,
      );
      expect([invoice.lines_cents, invoice.subtotal_cents, invoice.tax_cents, invoice.total_cents]).toEqual([
        linesCents,
        linesCents,
        tax,
        linesCents + tax,
      ]);
      expect(invoice.due_date).toBe(addDays(invoice.issue_date, 14));
    }
    // Each invoice's lines add up to its tickets' subtotals: the shear lines and each ticket's adjustment line.
    expect(
      await num(`SELECT count(*) AS n FROM (
                   SELECT t.id FROM tickets t JOIN invoice_lines l ON l.ticket_id = t.id AND l.invoice_id = t.invoice_id
                    GROUP BY t.id, t.subtotal_cents HAVING sum(l.amount_cents) <> t.subtotal_cents) x`),
    ).toBe(0);
    const years = groupBy(invoices, (invoice) => invoice.number.slice(3, 7));
    const counters = await rows<{ series: string; year: number; last_number: number }>(
      `SELECT series, year, last_number FROM document_counters`,
    );
    expect(years.size).toBeGreaterThanOrEqual(2);
    for (const [year, numbered] of years) {
      expect(numbered.map((invoice) => invoice.number)).toEqual(
        numbered.map((_, i) => `KR-${year}-${String(i + 1).padStart(4, '0')}`),
      );
      expect(numbered.every((invoice) => invoice.issue_date.startsWith(year))).toBe(true);
      const dates = numbered.map((invoice) => invoice.issue_date);
      expect(dates).toEqual([...dates].sort());
      expect(counters.find((c) => c.series === 'KR' && String(c.year) === year)?.last_number).toBe(numbered.length);
    }
    const stopBilled = await num(`SELECT count(*) AS n FROM invoices WHERE bill_to = 'stop'`);
    expect(stopBilled).toBeGreaterThan(0);
    expect(
      await num(`SELECT count(*) AS n FROM tickets t JOIN stops s ON s.id = t.stop_id JOIN invoices i ON i.id = t.invoice_id
                  WHERE (s.billing_mode = 'stop') <> (i.bill_to = 'stop')`),
    ).toBe(0);
  });

  it('records the money: on-site payments the day of the visit, invoices paid down by their payments and credit notes', async () => {
    expect(
      await num(
        `SELECT count(*) AS n FROM tickets t
                  WHERE t.settlement = 'paid-on-site' AND t.total_cents > 0
                    AND (SELECT coalesce(sum(p.amount_cents), 0) FROM payments p WHERE p.ticket_id = t.id
                          AND (p.recorded_at AT TIME ZONE $1)::date = t.visit_day) <> t.total_cents`,
        [TIME_ZONE],
      ),
    ).toBe(0);
    expect(
      await num(`SELECT count(*) AS n FROM payments WHERE (method = 'cheque' AND reference !~ '^[0-9]+$')
                   OR (method = 'card-terminal' AND reference = '') OR (method = 'online' AND external_id IS NULL)`),
    ).toBe(0);
    const money = await rows<{
      status: string;
      total_cents: number;
      paid_cents: number;
      credited_cents: number;
      paid: string;
      credited: string;
    }>(
      `SELECT i.status, i.total_cents, i.paid_cents, i.credited_cents,
              (SELECT coalesce(sum(amount_cents), 0) FROM payments p WHERE p.invoice_id = i.id) AS paid,
              (SELECT coalesce(sum(amount_cents), 0) FROM credit_notes c WHERE c.invoice_id = i.id) AS credited
         FROM invoices i`,
    );
    for (const invoice of money) {
      expect([invoice.paid_cents, invoice.credited_cents]).toEqual([Number(invoice.paid), Number(invoice.credited)]);
      const settled = invoice.paid_cents + invoice.credited_cents;
      const expected =
        invoice.status === 'void'
          ? 'void'
          : settled >= invoice.total_cents
            ? 'paid'
            : settled > 0
              ? 'part-paid'
              : 'sent';
      expect(invoice.status).toBe(expected);
    }
    // Most invoices are paid, some after their due date.
    expect(money.filter((i) => i.status === 'paid').length).toBeGreaterThan(money.length * 0.8);
    expect(
      await num(
        `SELECT count(*) AS n FROM payments p JOIN invoices i ON i.id = p.invoice_id
                  WHERE (p.recorded_at AT TIME ZONE $1)::date > i.due_date`,
        [TIME_ZONE],
      ),
    ).toBeGreaterThan(10);
  });

  it('leaves receivables of every age, a few part-paid, one void invoice issued again, one credit note', async () => {
    const open = await rows<{ days: number }>(
      `SELECT ($1::date - due_date) AS days FROM invoices WHERE status IN ('sent', 'part-paid')`,
      [today],
    );
    for (const [low, high] of [
      [-1000, 0],
      [1, 30],
      [31, 60],
      [61, 90],
      [91, 1000],
    ] as const) {
      expect(open.filter((invoice) => invoice.days >= low && invoice.days <= high).length).toBeGreaterThanOrEqual(1);
    }
    expect(await num(`SELECT count(*) AS n FROM invoices WHERE status = 'part-paid'`)).toBeGreaterThanOrEqual(2);
    const voided = await rows<{ id: string; void_reason: string; payments: string; tickets: string }>(
      `SELECT i.id, i.void_reason, (SELECT count(*) FROM payments p WHERE p.invoice_id = i.id) AS payments,
              (SELECT count(*) FROM tickets t WHERE t.invoice_id = i.id) AS tickets
         FROM invoices i WHERE i.status = 'void'`,
    );
    expect(voided).toHaveLength(1);
    expect(voided[0]!.void_reason).toMatch(/issued again as KR-\d{4}-\d{4}/);
    expect([voided[0]!.payments, voided[0]!.tickets]).toEqual(['0', '0']);
    expect(await num(`SELECT count(*) AS n FROM invoice_lines WHERE invoice_id = $1`, [voided[0]!.id])).toBeGreaterThan(
      0,
    );
    const credits = await rows<{ number: string; amount_cents: number; reason: string }>(
      `SELECT number, amount_cents, reason FROM credit_notes`,
    );
    expect(credits).toHaveLength(1);
    expect(credits[0]!.number).toMatch(/^CN-\d{4}-0001$/);
    expect(credits[0]!.reason.length).toBeGreaterThan(10);
  });

  it('writes one service line per pair worked, and registers no pair after its first ticket', async () => {
    expect(
      await num(`SELECT count(*) AS n FROM ticket_lines l JOIN tickets t ON t.id = l.ticket_id
                  WHERE (SELECT count(*) FROM shear_history h WHERE h.ticket_id = t.id AND h.shear_id = l.shear_id
                            AND h.kind = 'serviced' AND h.happened_on = t.visit_day) <> 1`),
    ).toBe(0);
    expect(
      await num(`SELECT count(*) AS n FROM shears s JOIN shear_history h ON h.shear_id = s.id AND h.kind = 'registered'
                  WHERE h.happened_on > (SELECT min(t.visit_day) FROM ticket_lines l JOIN tickets t ON t.id = l.ticket_id
                                          WHERE l.shear_id = s.id)`),
    ).toBe(0);
    // Nobody was invoiced for a stop they had not joined yet.
    expect(
      await num(
        `SELECT count(*) AS n FROM tickets t WHERE NOT EXISTS (
                   SELECT 1 FROM customer_stop_history h WHERE h.customer_id = t.customer_id AND h.stop_id = t.stop_id
                      AND (h.started_at AT TIME ZONE $1)::date <= t.visit_day
                      AND (h.ended_at IS NULL OR (h.ended_at AT TIME ZONE $1)::date > t.visit_day))`,
        [TIME_ZONE],
      ),
    ).toBe(0);
  });
});

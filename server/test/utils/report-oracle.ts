/**
 * The reports worked out again in plain TypeScript from the raw rows, written from the definitions in docs/reports.md
 * and not from the report SQL: the e2e test compares the two. Reads whole tables through simple SELECTs (the e2e
 * database is small) and does every join, share and rounding here.
 */
import type { DataSource } from 'typeorm';

interface TicketRow {
  id: string;
  stop_id: string | null;
  route_day_id: string | null;
  opened_by: string | null;
  kind: string;
  status: string;
  visit_day: string;
  subtotal_cents: number;
}
interface RouteDayRow {
  id: string;
  sharpener_id: string;
  day: string;
  drive_minutes: number;
  distance_km: number;
}
interface LegRow {
  route_day_id: string;
  stop_id: string;
  bench_minutes: number;
  drive_minutes_before: number;
  km_before: number;
}
interface LineRow {
  ticket_id: string;
  price_cents: number;
  override_cents: number | null;
  edge_type: string;
  tool_kind: string;
}

export interface Tables {
  tickets: TicketRow[];
  routeDays: RouteDayRow[];
  legs: LegRow[];
  lines: LineRow[];
  stops: {
    id: string;
    name: string;
    city: string;
    cadence_weeks: number;
    latitude: number | null;
    longitude: number | null;
    active: boolean;
  }[];
  users: { id: string; name: string }[];
  visits: { stop_id: string; worked_on: string; sharpener_id: string | null }[];
  invoices: {
    id: string;
    status: string;
    bill_to: string;
    customer_id: string | null;
    stop_id: string | null;
    issue_date: string | null;
    due_date: string | null;
    total_cents: number;
  }[];
  payments: { invoice_id: string | null; amount_cents: number; local_day: string }[];
  credits: { invoice_id: string; amount_cents: number; refund_method: string; local_day: string }[];
  customers: { id: string; name: string; stop_id: string | null }[];
  settings: { circuity: number; speed: number };
}

export async function readTables(dataSource: DataSource, timeZone: string): Promise<Tables> {
  const q = <T>(sql: string, params: unknown[] = []) => dataSource.query<T[]>(sql, params);
  const settings = await q<{ circuity: string; average_speed_kmh: number }>(
    `SELECT circuity, average_speed_kmh FROM planning_settings`,
  );
  return {
    tickets: await q(
      `SELECT id, stop_id, route_day_id, opened_by, kind, status, visit_day::text, subtotal_cents FROM tickets`,
    ),
    routeDays: await q(`SELECT id, sharpener_id, day::text, drive_minutes, distance_km FROM route_days`),
    legs: await q(`SELECT route_day_id, stop_id, bench_minutes, drive_minutes_before, km_before FROM route_day_stops`),
    lines: await q(
      `SELECT l.ticket_id, l.price_cents, l.override_cents, s.edge_type, s.tool_kind
         FROM ticket_lines l JOIN shears s ON s.id = l.shear_id`,
    ),
    stops: await q(`SELECT id, name, city, cadence_weeks, latitude, longitude, active FROM stops`),
    users: await q(`SELECT id, name FROM users`),
    visits: await q(`SELECT stop_id, worked_on::text, sharpener_id FROM stop_visits`),
    invoices: await q(
      `SELECT id, status, bill_to, customer_id, stop_id, issue_date::text, due_date::text, total_cents FROM invoices`,
    ),
    payments: await q(
      `SELECT invoice_id, amount_cents, (recorded_at AT TIME ZONE $1)::date::text AS local_day FROM payments`,
      [timeZone],
    ),
    credits: await q(
      `SELECT invoice_id, amount_cents, refund_method, (created_at AT TIME ZONE $1)::date::text AS local_day
         FROM credit_notes`,
      [timeZone],
    ),
    customers: await q(`SELECT id, name, stop_id FROM customers`),
    settings: settings[0]
      ? { circuity: Number(settings[0].circuity), speed: settings[0].average_speed_kmh }
      : { circuity: 1.3, speed: 40 },
  };
}

export interface Filter {
  from: string;
  to: string;
  /** The last route day that counts (the earlier of `to` and today). */
  routeTo: string;
  sharpenerId?: string | null;
}

export interface Figures {
  visits: number;
  tickets: number;
  shears: number;
  revenueCents: number;
  benchMinutes: number;
  driveMinutes: number;
  km: number;
}

const WORKED = new Set(['finished', 'handed-back']);
const inRange = (day: string, from: string, to: string) => day >= from && day <= to;
const divide = (a: number, b: number) => (b === 0 ? null : a / b);
export const roundOrNull = (value: number | null) => (value === null ? null : Math.round(value));

/** Tickets worked in the range, each with its sharpener and its count of shear lines. */
export function workedTickets(t: Tables, f: Filter) {
  const dayOf = new Map(t.routeDays.map((d) => [d.id, d]));
  const linesOf = new Map<string, number>();
  for (const line of t.lines) linesOf.set(line.ticket_id, (linesOf.get(line.ticket_id) ?? 0) + 1);
  return t.tickets
    .filter((ticket) => WORKED.has(ticket.status) && inRange(ticket.visit_day, f.from, f.to))
    .map((ticket) => ({
      ...ticket,
      sharpenerId: (ticket.route_day_id ? dayOf.get(ticket.route_day_id)?.sharpener_id : null) ?? ticket.opened_by,
      shears: linesOf.get(ticket.id) ?? 0,
    }))
    .filter((ticket) => !f.sharpenerId || ticket.sharpenerId === f.sharpenerId);
}

/** Each stop's time on each route day: bench, and the day's drive split in proportion to the legs into the stops. */
export function stopTimes(t: Tables, f: Filter) {
  const days = t.routeDays.filter(
    (d) => inRange(d.day, f.from, f.routeTo) && (!f.sharpenerId || d.sharpener_id === f.sharpenerId),
  );
  return days.flatMap((day) => {
    const legs = t.legs.filter((leg) => leg.route_day_id === day.id);
    const minutes = legs.reduce((s, l) => s + l.drive_minutes_before, 0);
    const km = legs.reduce((s, l) => s + l.km_before, 0);
    return legs.map((leg) => ({
      stopId: leg.stop_id,
      routeDayId: day.id,
      day: day.day,
      sharpenerId: day.sharpener_id,
      bench: leg.bench_minutes,
      drive: minutes > 0 ? (day.drive_minutes * leg.drive_minutes_before) / minutes : day.drive_minutes / legs.length,
      km: km > 0 ? (day.distance_km * leg.km_before) / km : day.distance_km / legs.length,
    }));
  });
}

/** Adds up a group: `key` picks the group of a ticket or a stop-day; visits are distinct stop-days. */
export function figuresBy(
  t: Tables,
  f: Filter,
  key: (row: { stopId: string | null; sharpenerId: string | null; day: string }) => string | null,
) {
  const groups = new Map<string, Figures & { visitKeys: Set<string> }>();
  const group = (k: string) => {
    let g = groups.get(k);
    if (!g) {
      g = {
        visits: 0,
        tickets: 0,
        shears: 0,
        revenueCents: 0,
        benchMinutes: 0,
        driveMinutes: 0,
        km: 0,
        visitKeys: new Set(),
      };
      groups.set(k, g);
    }
    return g;
  };
  for (const ticket of workedTickets(t, f)) {
    const k = key({ stopId: ticket.stop_id, sharpenerId: ticket.sharpenerId, day: ticket.visit_day });
    if (k === null) continue;
    const g = group(k);
    g.tickets += 1;
    g.shears += ticket.shears;
    g.revenueCents += ticket.subtotal_cents;
    if (ticket.stop_id && ticket.kind !== 'drop-off') g.visitKeys.add(`${ticket.stop_id} ${ticket.visit_day}`);
  }
  for (const time of stopTimes(t, f)) {
    const k = key({ stopId: time.stopId, sharpenerId: time.sharpenerId, day: time.day });
    if (k === null) continue;
    const g = group(k);
    g.benchMinutes += time.bench;
    g.driveMinutes += time.drive;
    g.km += time.km;
    g.visitKeys.add(`${time.stopId} ${time.day}`);
  }
  for (const g of groups.values()) g.visits = g.visitKeys.size;
  return groups;
}

/** The ratios the reports add to a group's figures. */
export function ratiosOf(g: Figures) {
  const route = g.benchMinutes + g.driveMinutes;
  return {
    routeMinutes: route,
    perVisitCents: roundOrNull(divide(g.revenueCents, g.visits)),
    perBenchHourCents: roundOrNull(divide(g.revenueCents * 60, g.benchMinutes)),
    perRouteHourCents: roundOrNull(divide(g.revenueCents * 60, route)),
    perKmCents: roundOrNull(divide(g.revenueCents, g.km)),
    shearsPerVisit: g.visits === 0 ? null : Math.round((g.shears / g.visits) * 100) / 100,
  };
}

/** What an invoice still owed at the end of a day, and how many days past due it was then. */
export function owedOn(t: Tables, asOf: string) {
  return t.invoices
    .filter((i) => ['sent', 'part-paid', 'paid'].includes(i.status) && i.issue_date !== null && i.issue_date <= asOf)
    .map((i) => {
      const paid = t.payments
        .filter((p) => p.invoice_id === i.id && p.local_day <= asOf)
        .reduce((s, p) => s + p.amount_cents, 0);
      const credited = t.credits
        .filter((c) => c.invoice_id === i.id && c.local_day <= asOf)
        .reduce((s, c) => s + c.amount_cents, 0);
      const daysLate = Math.round((Date.parse(asOf) - Date.parse(i.due_date!)) / 86_400_000);
      return { invoice: i, balance: i.total_cents - paid - credited, daysLate };
    })
    .filter((o) => o.balance > 0);
}

export function bucketOf(
  daysLate: number,
): 'currentCents' | 'days1to30Cents' | 'days31to60Cents' | 'days61to90Cents' | 'over90Cents' {
  if (daysLate <= 0) return 'currentCents';
  if (daysLate <= 30) return 'days1to30Cents';
  if (daysLate <= 60) return 'days31to60Cents';
  if (daysLate <= 90) return 'days61to90Cents';
  return 'over90Cents';
}

/** Great-circle distance in km (haversine formula, mean earth radius 6371 km). */
export function haversineKm(a: { latitude: number; longitude: number }, b: { latitude: number; longitude: number }) {
  const rad = (deg: number) => (deg * Math.PI) / 180;
  const h =
    Math.sin(rad(b.latitude - a.latitude) / 2) ** 2 +
    Math.cos(rad(a.latitude)) * Math.cos(rad(b.latitude)) * Math.sin(rad(b.longitude - a.longitude) / 2) ** 2;
  return 2 * 6371 * Math.asin(Math.sqrt(h));
}

export const daysBetween = (from: string, to: string) => Math.round((Date.parse(to) - Date.parse(from)) / 86_400_000);

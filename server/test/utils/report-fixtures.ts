/**
 * A half-year of invented past work for the report tests (the first half of 2019, so nothing else the e2e suite
 * writes falls in it): a few stops with coordinates and cadences, two sharpeners' route days with their legs, worked
 * tickets with shear lines (some overridden), open tickets that must not count, a drop-off off any route day,
 * stop visits, invoices with payments before and after the ageing date, a credit note with a refund and a void invoice.
 * Generated from a fixed seed, inserted with plain SQL: the reports are then checked against figures the test works out
 * itself from these rows (test/utils/report-oracle.ts).
 */
import type { DataSource, EntityManager } from 'typeorm';

export const REPORT_FROM = '2019-01-01';
export const REPORT_TO = '2019-06-30';
/** The ageing date: mid-range, so some invoices were still owed then and paid later. */
export const AGEING_AS_OF = '2019-05-15';

export interface ReportFixture {
  stopIds: string[];
  sharpenerIds: [string, string];
  /** A stop whose name a spreadsheet would run as a formula. */
  formulaStopName: string;
}

/** A small linear congruential generator (Numerical Recipes' constants): the same rows on every run. */
function random(seed: number) {
  let state = seed >>> 0;
  const next = () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
  return { next, int: (lo: number, hi: number) => lo + Math.floor(next() * (hi - lo + 1)) };
}

const addDays = (day: string, days: number) => {
  const d = new Date(`${day}T12:00:00Z`);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
};

const EDGE_TYPES = ['beveled', 'convex', 'semi-convex', 'serrated'] as const;
const TOOL_KINDS = ['straight', 'curved', 'thinning', 'blending'] as const;

async function one<T = { id: string }>(m: EntityManager, sql: string, params: unknown[]): Promise<T> {
  const rows = await m.query<T[]>(sql, params);
  return rows[0]!;
}

export async function insertReportFixture(dataSource: DataSource, sharpenerIds: [string, string], seed = 2019) {
  const rng = random(seed);
  const tag = Math.random().toString(36).slice(2, 8);
  const formulaStopName = `=SUM(A1) Salon ${tag}`;
  return dataSource.transaction(async (m): Promise<ReportFixture> => {
    const stops: { id: string; cadence: number; customers: { id: string; shears: string[] }[] }[] = [];
    const specs = [
      { name: `Harbour Lane Salon ${tag}`, lat: 44.02, lon: -92.47, cadence: 4 },
      { name: `Birchway Grooming ${tag}`, lat: 44.05, lon: -92.51, cadence: 6 },
      { name: `Old Mill Barbers ${tag}`, lat: 44.3, lon: -92.1, cadence: 4 },
      { name: formulaStopName, lat: 44.021, lon: -92.472, cadence: 8 },
    ];
    for (const [i, spec] of specs.entries()) {
      const stop = await one(
        m,
        `INSERT INTO stops (name, kind, street, city, latitude, longitude, cadence_weeks, billing_mode, tax_rate_bp)
         VALUES ($1, 'salon', $2, 'Larkhaven', $3, $4, $5, $6, 700) RETURNING id`,
        [spec.name, `${10 + i} Test Street`, spec.lat, spec.lon, spec.cadence, i === 1 ? 'stop' : 'customer'],
      );
      const customers = [];
      for (let c = 0; c < 3; c++) {
        const customer = await one(m, `INSERT INTO customers (name, stop_id) VALUES ($1, $2) RETURNING id`, [
          `Report Customer ${i}-${c} ${tag}`,
          stop.id,
        ]);
        const shears: string[] = [];
        for (let s = 0; s < 3; s++) {
          const shear = await one(
            m,
            `INSERT INTO shears (tag_code, customer_id, length_in, edge_type, tool_kind)
             VALUES ('KR-' || lpad(nextval('shear_tag_serial')::text, 6, '0'), $1, 6, $2, $3) RETURNING id`,
            [customer.id, EDGE_TYPES[rng.int(0, 3)], TOOL_KINDS[rng.int(0, 3)]],
          );
          shears.push(shear.id);
        }
        customers.push({ id: customer.id, shears });
      }
      stops.push({ id: stop.id, cadence: spec.cadence, customers });
    }

    // A visit before the range, so the first visit inside it has a previous one to be on time or late against.
    const visitDays = new Map<string, string[]>();
    for (const [i, stop] of stops.entries()) {
      const days: string[] = [];
      // Tuesdays only (2018-12-18 was one), so stops share route days; now and then a week early or up to three late.
      let day = addDays('2018-12-18', -i * 7);
      while (day <= REPORT_TO) {
        days.push(day);
        day = addDays(day, (stop.cadence + [-1, 0, 0, 0, 1, 2, 3][rng.int(0, 6)]!) * 7);
      }
      visitDays.set(stop.id, days);
    }

    // Route days: the stops visited on a day go on one sharpener's day, in the order of their legs.
    const byDay = new Map<string, string[]>();
    for (const [stopId, days] of visitDays) {
      for (const day of days) byDay.set(day, [...(byDay.get(day) ?? []), stopId]);
    }
    let invoiceSerial = 0;
    const toInvoice: {
      ticketId: string;
      customerId: string;
      stopId: string;
      billToStop: boolean;
      day: string;
      cents: number;
    }[] = [];
    for (const [day, stopIds] of [...byDay].sort()) {
      const sharpenerId = sharpenerIds[rng.int(0, 1)]!;
      const legs = stopIds.map(() => ({ minutes: rng.int(0, 40), km: rng.int(0, 300) / 10 }));
      const homeMinutes = rng.int(5, 30);
      const routeDay = await one(
        m,
        `INSERT INTO route_days (sharpener_id, day, start_label, start_latitude, start_longitude, shift_start,
           latest_finish, lunch_earliest, lunch_latest, lunch_minutes, distance_km, drive_minutes, bench_minutes)
         VALUES ($1, $2, 'Base', 44.0, -92.5, 480, 1080, 690, 810, 30, $3, $4, 0) RETURNING id`,
        [
          sharpenerId,
          day,
          legs.reduce((s, l) => s + l.km, 0) + homeMinutes / 2,
          legs.reduce((s, l) => s + l.minutes, 0) + homeMinutes,
        ],
      );
      for (const [position, stopId] of stopIds.entries()) {
        const bench = rng.int(20, 90);
        await m.query(
          `INSERT INTO route_day_stops (route_day_id, stop_id, position, arrival, start, leave, bench_minutes,
             drive_minutes_before, km_before) VALUES ($1, $2, $3, 540, 540, 600, $4, $5, $6)`,
          [routeDay.id, stopId, position, bench, legs[position]!.minutes, legs[position]!.km],
        );
        await m.query(`INSERT INTO stop_visits (stop_id, worked_on, sharpener_id) VALUES ($1, $2, $3)`, [
          stopId,
          day,
          sharpenerId,
        ]);
        const stop = stops.find((s) => s.id === stopId)!;
        // One visit in six nobody brings shears: time on the road, no revenue.
        if (rng.next() < 1 / 6) continue;
        const customers = stop.customers.filter(() => rng.next() < 0.6);
        for (const [n, customer] of (customers.length ? customers : [stop.customers[0]!]).entries()) {
          const status = rng.next() < 0.1 ? 'open' : rng.next() < 0.5 ? 'finished' : 'handed-back';
          const picked = customer.shears.filter(() => rng.next() < 0.7);
          const shears = picked.length ? picked : customer.shears.slice(0, 1);
          const prices = shears.map(() => rng.int(18, 45) * 100);
          const overrides = shears.map(() => (rng.next() < 0.15 ? rng.int(10, 30) * 100 : null));
          const trip = n === 0 && rng.next() < 0.3 ? 1500 : 0;
          const subtotal = prices.reduce((s, p, k) => s + (overrides[k] ?? p), 0) + trip;
          const tax = Math.round((subtotal * 700) / 10000);
          const settlement = rng.next() < 0.5 ? 'paid-on-site' : 'to-invoice';
          const ticket = await one(
            m,
            `INSERT INTO tickets (customer_id, stop_id, route_day_id, kind, status, visit_day, tax_rate_bp,
               rules_subtotal_cents, subtotal_cents, tax_cents, total_cents, settlement, opened_by, charge_trip, shear_count)
             VALUES ($1, $2, $3, 'visit', $4, $5, 700, $6, $6, $7, $8, $9, $10, $11, $12) RETURNING id`,
            [
              customer.id,
              stopId,
              routeDay.id,
              status,
              day,
              subtotal,
              tax,
              subtotal + tax,
              settlement,
              sharpenerId,
              trip > 0,
              shears.length,
            ],
          );
          for (const [k, shearId] of shears.entries()) {
            await m.query(
              `INSERT INTO ticket_lines (ticket_id, shear_id, price_cents, override_cents, override_reason, position)
               VALUES ($1, $2, $3, $4, $5, $6)`,
              [ticket.id, shearId, prices[k], overrides[k], overrides[k] === null ? null : 'Regular, agreed price', k],
            );
          }
          if (status === 'open') continue;
          if (settlement === 'paid-on-site') {
            await m.query(
              `INSERT INTO payments (ticket_id, method, amount_cents, reference, recorded_at)
               VALUES ($1, 'cash', $2, '', ($3::date + time '15:00') AT TIME ZONE 'America/Chicago')`,
              [ticket.id, subtotal + tax, day],
            );
          } else {
            toInvoice.push({
              ticketId: ticket.id,
              customerId: customer.id,
              stopId,
              billToStop: stop === stops[1],
              day,
              cents: subtotal + tax,
            });
          }
        }
      }
    }

    // A drop-off nobody drove to: revenue for the stop and the sharpener who opened it, no visit, no route day.
    const dropOffCustomer = stops[0]!.customers[0]!;
    await m.query(
      `INSERT INTO tickets (customer_id, stop_id, kind, status, visit_day, subtotal_cents, total_cents, opened_by, settlement)
       VALUES ($1, $2, 'drop-off', 'handed-back', '2019-03-13', 5400, 5400, $3, 'paid-on-site')`,
      [dropOffCustomer.id, stops[0]!.id, sharpenerIds[1]],
    );

    // One invoice per to-invoice ticket, issued on its day, 14 days' terms; paid at random delays, some never.
    for (const [k, item] of toInvoice.entries()) {
      invoiceSerial++;
      const voided = k === 3;
      const invoice = await one(
        m,
        `INSERT INTO invoices (number, status, bill_to, customer_id, stop_id, bill_to_name, issue_date, due_date,
           terms_days, lines_cents, subtotal_cents, total_cents, void_reason)
         VALUES ($1, $2, $3, $4, $5, 'Report party', $6, $6::date + 14, 14, $7, $7, $7, $8) RETURNING id`,
        [
          `RT-${tag}-${invoiceSerial}`,
          voided ? 'void' : 'sent',
          item.billToStop ? 'stop' : 'customer',
          item.billToStop ? null : item.customerId,
          item.billToStop ? item.stopId : null,
          item.day,
          item.cents,
          voided ? 'Billed twice by mistake' : null,
        ],
      );
      await m.query(`UPDATE tickets SET invoice_id = $1 WHERE id = $2`, [invoice.id, item.ticketId]);
      if (voided) continue;
      const roll = rng.next();
      if (roll < 0.55) {
        const paidOn = addDays(item.day, rng.int(3, 70));
        await m.query(
          `INSERT INTO payments (invoice_id, method, amount_cents, reference, recorded_at)
           VALUES ($1, 'cheque', $2, $3, ($4::date + time '10:00') AT TIME ZONE 'America/Chicago')`,
          [invoice.id, item.cents, `CHQ ${1000 + k}`, paidOn],
        );
        await m.query(`UPDATE invoices SET status = 'paid', paid_cents = $2 WHERE id = $1`, [invoice.id, item.cents]);
      } else if (roll < 0.75) {
        const part = Math.floor(item.cents / 2);
        await m.query(
          `INSERT INTO payments (invoice_id, method, amount_cents, reference, recorded_at)
           VALUES ($1, 'card-terminal', $2, $3, ($4::date + time '23:30') AT TIME ZONE 'America/Chicago')`,
          [invoice.id, part, `TERM ${k}`, addDays(item.day, rng.int(1, 40))],
        );
        await m.query(`UPDATE invoices SET status = 'part-paid', paid_cents = $2 WHERE id = $1`, [invoice.id, part]);
      } else if (roll < 0.8) {
        await m.query(
          `INSERT INTO credit_notes (number, invoice_id, amount_cents, reason, refund_method, created_at)
           VALUES ($1, $2, $3, 'One pair returned unsharpened', 'cash', ($4::date + time '09:00') AT TIME ZONE 'America/Chicago')`,
          [`RC-${tag}-${k}`, invoice.id, Math.min(1000, item.cents), addDays(item.day, 20)],
        );
        await m.query(`UPDATE invoices SET credited_cents = $2 WHERE id = $1`, [
          invoice.id,
          Math.min(1000, item.cents),
        ]);
      }
    }
    return { stopIds: stops.map((s) => s.id), sharpenerIds, formulaStopName };
  });
}

/**
 * The whole invented registry of the demo scenario (Larkhaven's stops, customers and shears) as rows to insert.
 * A pure function of the seed, "today" and the demo users' ids: the same inputs give the same rows.
 */
import { randomUUID } from 'node:crypto';
import { buildDemoCustomers, type CustomerRow, type HistoryRow } from './demo-customers';
import { DemoRandom } from './demo-random';
import { buildDemoShears, type ShearHistoryRow, type ShearRow } from './demo-shears';
import { buildDemoStops, type DemoPeopleIds, type StopRow, type VisitRow } from './demo-stops';

export const DEMO_SEED = 0x6b72_2025;

export interface DemoRegistry {
  stops: StopRow[];
  visits: VisitRow[];
  customers: CustomerRow[];
  customerHistory: HistoryRow[];
  /** In registration order; tag codes are given in this order. */
  shears: ShearRow[];
  shearHistory: ShearHistoryRow[];
}

export function buildDemoRegistry(
  today: string,
  people: DemoPeopleIds,
  newId: () => string = randomUUID,
  seed = DEMO_SEED,
): DemoRegistry {
  const rng = new DemoRandom(seed);
  const stops = buildDemoStops(rng, today, people, newId);
  const customers = buildDemoCustomers(rng, stops, today, people, newId);
  const shears = buildDemoShears(rng, customers, today, newId);
  return {
    stops: stops.map((stop) => stop.row),
    visits: stops.flatMap((stop) => stop.visits),
    customers: customers.map((customer) => customer.row),
    customerHistory: customers.flatMap((customer) => customer.history),
    shears: shears.rows,
    shearHistory: shears.history,
  };
}

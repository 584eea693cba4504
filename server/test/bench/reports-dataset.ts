/**
 * The report benchmark's dataset: 500 invented stops, 5,000 customers and their shears, and three years of invented
 * work over them, about 200,000 ticket lines with their route days, stop visits, invoices and payments, made by the
 * demo seed's own history generator at a larger scale.
 *
 *   cd server && DATABASE_URL=postgres://… ../node_modules/.bin/ts-node --transpile-only test/bench/reports-dataset.ts
 *
 * or `npm run reports:dataset` from the top. It runs pending migrations, then refuses a database that already holds
 * stops: point it at an empty scratch database. DATASET_STOPS, DATASET_CUSTOMERS, DATASET_LINES and DATASET_YEARS
 * change the size.
 */
import './bench-environment';
import 'reflect-metadata';
import { cpus } from 'node:os';
import { performance } from 'node:perf_hooks';
import { DataSource } from 'typeorm';
import { DEMO_SEED } from '../../src/database/seeds/demo-registry';
import type { HistoryScale } from '../../src/database/seeds/history/history-options';
import { seedHistory } from '../../src/database/seeds/history/seed-history';
import { seedDemoBasics } from '../../src/database/seeds/seed-demo';
import { typeormOptions } from '../../src/database/typeorm-options';
import { seedBenchRegistry } from './dataset/bench-registry';

const number = (name: string, fallback: number) => {
  const value = Number(process.env[name] ?? fallback);
  if (!Number.isInteger(value) || value <= 0) throw new Error(`${name} must be a whole number above 0.`);
  return value;
};
const STOPS = number('DATASET_STOPS', 500);
const CUSTOMERS = number('DATASET_CUSTOMERS', 5000);
const LINES = number('DATASET_LINES', 200_000);
const YEARS = number('DATASET_YEARS', 3);
const TIME_ZONE = process.env.BUSINESS_TIME_ZONE ?? 'America/Chicago';

/**
 * Ten customers a stop bring about eighteen pairs a visit: sixteen sharpeners share the work, a day holding up to eight
 * stops and about seven hours at the bench.
 */
const DATASET_SCALE: HistoryScale = {
  years: YEARS,
  visitUnvisitedStops: true,
  ticketChance: 0.75,
  lineChance: 0.8,
  targetLines: LINES,
  maxStopsPerDay: 8,
  benchBudgetMinutes: 420,
  lateVisitChance: 0.1,
};

async function main(): Promise<void> {
  const started = performance.now();
  const phases: { phase: string; seconds: number }[] = [];
  const lap = (phase: string, since: number) =>
    phases.push({ phase, seconds: Math.round((performance.now() - since) / 100) / 10 });
  const dataSource = await new DataSource(typeormOptions(process.env.DATABASE_URL!)).initialize();
  try {
    await dataSource.runMigrations({ transaction: 'each' });
    const today = new Date().toISOString().slice(0, 10);
    const counts = await dataSource.transaction(async (manager) => {
      if ((await manager.query<{ n: number }[]>(`SELECT count(*)::int AS n FROM stops`))[0]!.n > 0) {
        throw new Error('This database already holds stops: point DATABASE_URL at an empty scratch database.');
      }
      let since = performance.now();
      await seedDemoBasics(manager);
      const registry = await seedBenchRegistry(manager, {
        today,
        years: YEARS,
        seed: DEMO_SEED + 7,
        size: { stops: STOPS, customersPerStop: Math.max(1, Math.round(CUSTOMERS / STOPS)), extraSharpeners: 14 },
      });
      lap('registry', since);
      since = performance.now();
      const history = await seedHistory(manager, {
        today,
        timeZone: TIME_ZONE,
        seed: DEMO_SEED + 8,
        stopIds: null,
        scale: DATASET_SCALE,
      });
      lap('history (built and written)', since);
      return { registry, history };
    });
    let since = performance.now();
    // Fresh statistics, so the planner's choices (and the benchmark's EXPLAINs) are those of a settled database.
    await dataSource.query('ANALYZE');
    lap('analyze', since);
    since = performance.now();
    const tables = await dataSource.query<{ table: string; rows: number }[]>(
      `SELECT relname AS table, n_live_tup::int AS rows FROM pg_stat_user_tables
        WHERE relname IN ('stops', 'customers', 'shears', 'stop_visits', 'route_days', 'route_day_stops', 'tickets',
                          'ticket_lines', 'invoices', 'invoice_lines', 'payments', 'credit_notes', 'shear_history',
                          'invoice_reminders')
        ORDER BY relname`,
    );
    lap('count', since);
    console.log(
      `Report dataset (invented): ${counts.history.from} to ${counts.history.to}, ` +
        `${counts.registry.sharpeners} sharpeners; Node ${process.version}, ${cpus().length} cores`,
    );
    console.table(tables);
    console.table(phases);
    console.log(`Total ${Math.round((performance.now() - started) / 100) / 10} s.`);
  } finally {
    await dataSource.destroy();
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? (error.stack ?? error.message) : error);
  process.exitCode = 1;
});

/**
 * The report benchmark: every report route of the owner's reports through the real HTTP API, in the same process as
 * the app, on the large invented dataset (npm run reports:dataset): the default range (twelve months), the whole
 * three years, and one sharpener's work. Each route is asked BENCH_WARMUPS times (3) unmeasured, then BENCH_ROUNDS
 * times (20); the table gives the median and 95th percentile. Then each report's SQL (REPORT_QUERIES, the statements
 * the service runs) goes through EXPLAIN (ANALYZE, FORMAT JSON), and every sequential scan of a table over 10,000
 * rows is listed.
 *
 *   cd server && DATABASE_URL=postgres://… ../node_modules/.bin/ts-node --transpile-only test/bench/reports.bench.ts
 *
 * or `npm run bench:reports` from the top. It reads only, apart from signing in (and adding an owner when the
 * database has none that can sign in with the demo password).
 */
import './bench-environment';
import 'reflect-metadata';
import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { cpus, loadavg } from 'node:os';
import { performance } from 'node:perf_hooks';
import { DataSource } from 'typeorm';
import type { AppConfig } from '../../src/config/environment';
import { DEMO_EMAILS, DEMO_PASSWORD } from '../../src/database/seeds/demo-users';
import { REPORT_NAMES, REPORT_QUERIES, type ReportName } from '../../src/reports/report-queries';
import { reportRange } from '../../src/reports/report-range';
import { todayIn } from '../../src/stops/business-today';
import { createTestApp, createUser, TEST_PASSWORD } from '../utils/test-app';
import { seqScansOver, type PlanNode } from './explain-scans';
import { round1 } from './bench-stats';

const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 20);
const WARMUPS = Number(process.env.BENCH_WARMUPS ?? 3);
/** A sequential scan of a table this big is worth an index. */
const BIG_TABLE_ROWS = 10_000;

interface Variant {
  label: string;
  query: Record<string, string>;
}

interface Route {
  name: ReportName;
  path: string;
  extra?: Record<string, string>;
}

const percentile = (sorted: number[], share: number) => sorted[Math.max(0, Math.ceil(share * sorted.length) - 1)]!;

async function signIn(base: string, app: INestApplication): Promise<Record<string, string>> {
  const login = async (email: string, password: string) =>
    fetch(`${base}/api/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email, password }),
    });
  let response = await login(DEMO_EMAILS.owner, DEMO_PASSWORD);
  if (!response.ok) {
    const owner = await createUser(app, 'owner');
    response = await login(owner.email, TEST_PASSWORD);
  }
  const body = (await response.json()) as { accessToken?: string };
  if (!response.ok || !body.accessToken) throw new Error(`Signing in as an owner answered ${response.status}.`);
  return { Authorization: `Bearer ${body.accessToken}` };
}

async function main(): Promise<void> {
  const app = await createTestApp();
  await app.listen(0, '127.0.0.1');
  const base = await app.getUrl();
  try {
    const db = app.get(DataSource);
    const timeZone = app.get<ConfigService<AppConfig, true>>(ConfigService).get('BUSINESS_TIME_ZONE', { infer: true });
    const today = todayIn(timeZone);
    const [facts] = await db.query<
      { first: string | null; sharpener: string | null; stop: string | null; lines: number }[]
    >(
      `SELECT to_char(min(visit_day), 'YYYY-MM-DD') AS first,
              (SELECT sharpener_id FROM route_days GROUP BY 1 ORDER BY count(*) DESC, 1 LIMIT 1) AS sharpener,
              (SELECT stop_id FROM tickets WHERE stop_id IS NOT NULL GROUP BY 1 ORDER BY count(*) DESC, 1 LIMIT 1) AS stop,
              (SELECT count(*)::int FROM ticket_lines) AS lines
         FROM tickets`,
    );
    if (!facts?.first || !facts.sharpener || !facts.stop) {
      throw new Error('This database has no worked tickets: load the dataset first (npm run reports:dataset).');
    }
    const variants: Variant[] = [
      { label: 'default (12 months)', query: {} },
      { label: `all (${facts.first} to ${today})`, query: { from: facts.first, to: today } },
      { label: 'one sharpener, 12 months', query: { sharpenerId: facts.sharpener } },
    ];
    const routes: Route[] = [
      ...REPORT_NAMES.map((name): Route => ({ name, path: `/api/reports/${name}` })),
      { name: 'months', path: '/api/reports/months', extra: { stopId: facts.stop } },
      { name: 'receivables', path: '/api/reports/receivables', extra: { groupBy: 'stop' } },
      ...REPORT_NAMES.map((name): Route => ({ name, path: `/api/reports/${name}/csv` })),
    ];
    const auth = await signIn(base, app);
    const load = loadavg();

    const results: Record<string, string | number>[] = [];
    for (const variant of variants) {
      for (const route of routes) {
        const url = `${base}${route.path}?${new URLSearchParams({ ...variant.query, ...route.extra }).toString()}`;
        const times: number[] = [];
        let bytes = 0;
        let rows: number | string = '';
        for (let i = 0; i < WARMUPS + ROUNDS; i++) {
          const started = performance.now();
          const response = await fetch(url, { headers: auth });
          const text = await response.text();
          const ms = performance.now() - started;
          if (!response.ok) throw new Error(`GET ${route.path} answered ${response.status}: ${text.slice(0, 300)}`);
          if (i >= WARMUPS) times.push(ms);
          bytes = text.length;
          if (i === 0) {
            rows = route.path.endsWith('/csv')
              ? text.split('\n').filter((line) => line.length > 0).length - 1
              : (JSON.parse(text) as { rows: unknown[] }).rows.length;
          }
        }
        const sorted = [...times].sort((a, b) => a - b);
        // One line a route on stderr, so a long run shows it is alive; the table comes at the end.
        process.stderr.write(`${variant.label}: ${route.path} ${round1(percentile(sorted, 0.5))} ms\n`);
        results.push({
          range: variant.label,
          route: `${route.path.replace('/api/reports/', '')}${route.extra ? ` ${new URLSearchParams(route.extra).toString().replace(/=[0-9a-f-]{36}/, '=…')}` : ''}`,
          rows,
          kib: round1(bytes / 1024),
          medianMs: round1(percentile(sorted, 0.5)),
          p95Ms: round1(percentile(sorted, 0.95)),
        });
      }
    }

    console.log(
      `Report benchmark: ${facts.lines.toLocaleString('en-US')} ticket lines from ${facts.first}; ` +
        `${WARMUPS} warm-ups then ${ROUNDS} rounds per route; today ${today} (${timeZone})`,
    );
    console.log(
      `Node ${process.version}, ${cpus().length} cores (${cpus()[0]?.model ?? 'unknown CPU'}); ` +
        `load average before: ${load.map((value) => value.toFixed(2)).join(', ')}`,
    );
    console.table(results);

    // The plans: every report's own SQL, as the service runs it, for each range.
    const sizes = new Map(
      (
        await db.query<{ relname: string; rows: number }[]>(
          `SELECT relname, reltuples::float8 AS rows FROM pg_class WHERE relkind = 'r' AND relnamespace = 'public'::regnamespace`,
        )
      ).map((row) => [row.relname, row.rows]),
    );
    const plans: Record<string, string | number>[] = [];
    for (const variant of variants) {
      const range = reportRange(variant.query, today);
      const statements = [
        ...REPORT_NAMES.map((name) => ({ name, label: name, options: {} })),
        { name: 'months' as const, label: 'months (one stop)', options: { stopId: facts.stop } },
        { name: 'receivables' as const, label: 'receivables (by stop)', options: { groupBy: 'stop' as const } },
      ];
      for (const { name, label, options } of statements) {
        const { sql, params } = REPORT_QUERIES[name](range, { timeZone, ...options });
        const [row] = await db.query<{ 'QUERY PLAN': [{ Plan: PlanNode; 'Execution Time': number }] }[]>(
          `EXPLAIN (ANALYZE, FORMAT JSON) ${sql}`,
          params,
        );
        const plan = row!['QUERY PLAN'][0];
        const scans = seqScansOver(plan.Plan, sizes, BIG_TABLE_ROWS);
        plans.push({
          range: variant.label,
          report: label,
          executionMs: round1(plan['Execution Time']),
          seqScansOver10k:
            scans.length > 0
              ? scans
                  .map(
                    (s) =>
                      `${s.table} (${s.tableRows.toLocaleString('en-US')} rows, read ${s.rowsRead.toLocaleString('en-US')})`,
                  )
                  .join('; ')
              : '-',
        });
      }
    }
    console.log('EXPLAIN (ANALYZE) of each report query: sequential scans of tables over 10,000 rows');
    console.table(plans);
  } finally {
    await app.close();
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? (error.stack ?? error.message) : error);
  process.exitCode = 1;
});

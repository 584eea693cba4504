/**
 * The CSV import benchmark: previews and commits 5,000 shear rows through the real HTTP API, timing each step and
 * measuring how late the event loop ran meanwhile (perf_hooks.monitorEventLoopDelay), while health checks keep
 * asking the same process for an answer.
 *
 *   cd server && DATABASE_URL=postgres://… ../node_modules/.bin/ts-node --transpile-only test/bench/import.bench.ts
 *
 * ts-node, not tsx: Nest's dependency injection needs the decorator metadata that only TypeScript emits. It runs
 * pending migrations and adds invented customers and shears to that database: point it at a scratch one.
 * BENCH_ROWS and BENCH_ROUNDS change the size (5000) and the number of measured rounds (3).
 */
import './bench-environment';
import 'reflect-metadata';
import { EDGE_TYPES, TOOL_KINDS } from '@keenroute/shared';
import type { INestApplication } from '@nestjs/common';
import { randomUUID } from 'node:crypto';
import { cpus, loadavg } from 'node:os';
import { monitorEventLoopDelay, performance } from 'node:perf_hooks';
import Papa from 'papaparse';
import { DataSource } from 'typeorm';
import { Customer } from '../../src/customers/entities/customer.entity';
import { typeormOptions } from '../../src/database/typeorm-options';
import { createTestApp, createUser, TEST_PASSWORD } from '../utils/test-app';
import { median, round1 } from './bench-stats';

const ROWS = Number(process.env.BENCH_ROWS ?? 5000);
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 3);
const CUSTOMERS = 25;

interface Phase {
  ms: number;
  loopP99Ms: number;
  loopMaxMs: number;
  healthAnswers: number;
  healthSlowestMs: number;
}

/** Runs one request while health checks go out one after another, and reads the event-loop delay meanwhile. */
async function measure(base: string, action: () => Promise<Response>): Promise<{ response: Response; phase: Phase }> {
  const histogram = monitorEventLoopDelay({ resolution: 5 });
  let done = false;
  const healthTimes: number[] = [];
  histogram.enable();
  const started = performance.now();
  const running = action().finally(() => {
    done = true;
  });
  const probing = (async () => {
    while (!done) {
      const sent = performance.now();
      await fetch(`${base}/api/health`);
      if (!done) healthTimes.push(performance.now() - sent);
    }
  })();
  const response = await running;
  const ms = performance.now() - started;
  histogram.disable();
  await probing;
  return {
    response,
    phase: {
      ms: round1(ms),
      loopP99Ms: round1(histogram.percentile(99) / 1e6),
      loopMaxMs: round1(histogram.max / 1e6),
      healthAnswers: healthTimes.length,
      healthSlowestMs: round1(Math.max(0, ...healthTimes)),
    },
  };
}

async function expectOk(response: Response, what: string): Promise<Record<string, unknown>> {
  const body = (await response.json()) as Record<string, unknown>;
  if (!response.ok) throw new Error(`${what} answered ${response.status}: ${JSON.stringify(body).slice(0, 500)}`);
  return body;
}

async function main(): Promise<void> {
  const migrator = await new DataSource(typeormOptions(process.env.DATABASE_URL!)).initialize();
  await migrator.runMigrations({ transaction: 'each' });
  await migrator.destroy();

  const app: INestApplication = await createTestApp();
  await app.listen(0, '127.0.0.1');
  const base = await app.getUrl();
  try {
    const office = await createUser(app, 'office');
    const login = await expectOk(
      await fetch(`${base}/api/auth/login`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ email: office.email, password: TEST_PASSWORD }),
      }),
      'Sign-in',
    );
    const auth = { Authorization: `Bearer ${String(login.accessToken)}` };
    const run = randomUUID().slice(0, 8);
    const customers = app.get(DataSource).getRepository(Customer);
    const emails = Array.from({ length: CUSTOMERS }, (_, i) => `bench-${run}-${i}@bench.keenroute.test`);
    await customers.insert(emails.map((email, i) => ({ name: `Bench customer ${i} (invented)`, email })));

    const fileFor = (rows: number) =>
      Papa.unparse(
        Array.from({ length: rows }, (_, i) => ({
          customer_email: emails[i % CUSTOMERS]!,
          make: 'Example Works',
          model: `K-${i}`,
          length_in: String(5 + (i % 13) * 0.25),
          edge_type: EDGE_TYPES[i % EDGE_TYPES.length]!,
          tool_kind: TOOL_KINDS[i % TOOL_KINDS.length]!,
          handedness: i % 10 === 0 ? 'left' : 'right',
          use: i % 3 === 0 ? 'grooming' : 'hair',
          notes: `Bench row ${i}, invented`,
        })),
      );

    const importOnce = async (rows: number) => {
      const text = fileFor(rows);
      const form = new FormData();
      form.set('kind', 'shears');
      form.set('file', new Blob([text], { type: 'text/csv' }), 'bench-shears.csv');
      const preview = await measure(base, () =>
        fetch(`${base}/api/imports`, { method: 'POST', headers: auth, body: form }),
      );
      const previewBody = await expectOk(preview.response, 'The preview');
      if (previewBody.validCount !== rows)
        throw new Error(`The preview found problems: ${JSON.stringify(previewBody.errors)}`);
      const commit = await measure(base, () =>
        fetch(`${base}/api/imports/${String(previewBody.id)}/commit`, { method: 'POST', headers: auth }),
      );
      const commitBody = await expectOk(commit.response, 'The commit');
      if (commitBody.created !== rows) throw new Error(`The commit created ${String(commitBody.created)} rows.`);
      return { bytes: Buffer.byteLength(text), preview: preview.phase, commit: commit.phase };
    };

    await importOnce(500); // warm-up: JIT, connection pool, prepared plans
    // The same probes with no import running: what the machine itself adds to the delay.
    const idle = await measure(base, async () => {
      await new Promise((resolve) => setTimeout(resolve, 1000));
      return new Response(null);
    });
    const load = loadavg();
    const results = [];
    for (let round = 1; round <= ROUNDS; round += 1) results.push(await importOnce(ROWS));

    console.log(
      `CSV import benchmark: ${ROWS} shear rows (${(results[0]!.bytes / 1024).toFixed(0)} KiB), ${ROUNDS} rounds`,
    );
    console.log(`Node ${process.version}, ${cpus().length} cores (${cpus()[0]?.model ?? 'unknown CPU'})`);
    console.table([
      { round: '-', step: 'idle (health checks only)', ...idle.phase },
      ...results.flatMap((result, index) => [
        { round: index + 1, step: 'preview', ...result.preview },
        { round: index + 1, step: 'commit', ...result.commit },
      ]),
    ]);
    console.log(`load average (1, 5, 15 min) before the rounds: ${load.map((value) => value.toFixed(2)).join(', ')}`);
    for (const step of ['preview', 'commit'] as const) {
      const phases = results.map((result) => result[step]);
      console.log(
        `${step} median: ${median(phases.map((p) => p.ms))} ms; event-loop delay p99 ${median(phases.map((p) => p.loopP99Ms))} ms, ` +
          `max ${median(phases.map((p) => p.loopMaxMs))} ms; health answered ${median(phases.map((p) => p.healthAnswers))} times ` +
          `(slowest ${median(phases.map((p) => p.healthSlowestMs))} ms)`,
      );
    }
  } finally {
    await app.close();
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exitCode = 1;
});

/**
 * The load benchmark: a running server on the large invented dataset (npm run reports:dataset), 100 connections for
 * 60 seconds, as two autocannon runs at the same time so reads and writes keep their own latencies:
 *
 * - reads (80 connections): sharpeners' day sheets, the stops and shears lists (pages and sort orders walked
 *   through), stop and shear searches, and the public booking page's data (a stop, the stop search, a quote);
 * - writes (20 connections): bench status steps and notes on the pairs of open tickets (opened first when the
 *   database has too few), and public mail-in booking requests.
 *
 * Meanwhile the database's connections are counted every second. The table gives requests, req/s, p50/p95/p99
 * latency, non-2xx answers and errors for reads, writes and all, against the p95 targets (100 ms reads, 200 ms
 * writes). Any error, timeout or non-2xx answer (a 429 included) exits 1.
 *
 *   BASE_URL=http://127.0.0.1:3000 DATABASE_URL=postgres://… npm run bench:load
 *
 * DURATION (seconds), CONNECTIONS, WRITE_CONNECTIONS, LIST_PAGES (20) and CONNECTION_RATE (req/s per connection;
 * unset: as fast as answers come) change the run. It writes: open tickets with pairs (reused by later runs), line
 * notes and bench statuses on them, and mail-in bookings.
 */
import 'reflect-metadata';
import autocannon, { type Result } from 'autocannon';
import { hash } from 'bcryptjs';
import { cpus, loadavg } from 'node:os';
import { DataSource } from 'typeorm';
import { BCRYPT_COST } from '../../src/auth/jwt.constants';
import { DEMO_EMAILS, DEMO_PASSWORD } from '../../src/database/seeds/demo-users';
import { ConnectionPoll } from './load/connection-poll';
import { LoadMix, type LoadKind, type RouteRecord } from './load/load-mix';
import { loadSettings } from './load/load-settings';
import { kindRows, routeRows } from './load/load-table';
import { findTargets, prepareBenchLines } from './load/load-targets';
import { Sessions } from './load/sessions';

/** Signs in for the lists and searches when the demo office cannot (a dataset without the demo people). */
const LOAD_OFFICE = 'load-office@bench.keenroute.test';
/** Longer than any answer should take under load; a request still open then counts as a timeout. */
const TIMEOUT_SECONDS = 10;

async function signInOffice(db: DataSource, sessions: Sessions): Promise<string> {
  try {
    await sessions.signIn([DEMO_EMAILS.office]);
    return DEMO_EMAILS.office;
  } catch {
    const passwordHash = await hash(DEMO_PASSWORD, BCRYPT_COST);
    await db.query(
      `INSERT INTO users (email, name, role, password_hash)
       SELECT $1, 'Load Office (invented)', 'office', $2
        WHERE NOT EXISTS (SELECT 1 FROM users WHERE lower(email) = $1)`,
      [LOAD_OFFICE, passwordHash],
    );
    await db.query(`UPDATE users SET password_hash = $2, active = true WHERE lower(email) = $1`, [
      LOAD_OFFICE,
      passwordHash,
    ]);
    await sessions.signIn([LOAD_OFFICE]);
    return LOAD_OFFICE;
  }
}

async function main(): Promise<void> {
  const settings = loadSettings();
  const { baseUrl } = settings;
  const health = await fetch(`${baseUrl}/api/health`).catch((error: Error) => {
    throw new Error(`No server answers at ${baseUrl} (${error.message}): start it, or set BASE_URL.`);
  });
  if (!health.ok) throw new Error(`${baseUrl}/api/health answered ${health.status}.`);

  const db = new DataSource({ type: 'postgres', url: settings.databaseUrl, extra: { max: 2 } });
  await db.initialize();
  const sessions = new Sessions(baseUrl, DEMO_PASSWORD);
  try {
    const targets = await findTargets(db);
    const office = await signInOffice(db, sessions);
    await sessions.signIn(targets.sharpeners);
    targets.benchLines = await prepareBenchLines(db, targets, sessions, baseUrl);
    const mix = new LoadMix(targets, sessions, office, settings.listPages);
    await mix.preflight(baseUrl);

    let signInFailure: Error | undefined;
    sessions.keepSignedIn((error) => (signInFailure ??= error));
    const poll = new ConnectionPoll(db);
    const load = loadavg();
    const readConnections = settings.connections - settings.writeConnections;
    const pace =
      settings.connectionRate > 0
        ? `${settings.connectionRate} req/s each`
        : 'each request as soon as the last is answered';
    process.stderr.write(
      `Load: ${readConnections} reading + ${settings.writeConnections} writing connections (${pace}) for ` +
        `${settings.durationSeconds} s against ${baseUrl}…\n`,
    );
    poll.start();
    const run = (connections: number, requests: autocannon.Request[]) =>
      autocannon({
        url: baseUrl,
        connections,
        duration: settings.durationSeconds,
        timeout: TIMEOUT_SECONDS,
        requests,
        ...(settings.connectionRate > 0 ? { connectionRate: settings.connectionRate } : {}),
      });
    const [reads, writes] = await Promise.all([
      run(readConnections, mix.reads()),
      run(settings.writeConnections, mix.writes()),
    ]);
    const connections = poll.stop();
    sessions.stop();
    if (signInFailure) throw signInFailure;

    const results: Record<LoadKind, Result> = { reads, writes };
    const records: RouteRecord[] = [...mix.records.values()];
    const [dataset] = await db.query<{ tickets: number; lines: number; open: number }[]>(
      `SELECT (SELECT count(*)::int FROM tickets) AS tickets, (SELECT count(*)::int FROM ticket_lines) AS lines,
              (SELECT count(*)::int FROM tickets WHERE status = 'open') AS open`,
    );
    console.log(
      `Load benchmark: ${settings.connections} connections (${readConnections} reads, ${settings.writeConnections} ` +
        `writes; ${pace}) for ${settings.durationSeconds} s against ${baseUrl}`,
    );
    console.log(
      `Dataset: ${targets.stopCount} stops, ${targets.shearCount.toLocaleString('en-US')} shears, ` +
        `${dataset!.tickets.toLocaleString('en-US')} tickets (${dataset!.lines.toLocaleString('en-US')} lines); ` +
        `${targets.daySheets.length} day sheets of ${targets.sharpeners.length} sharpeners; ` +
        `${targets.benchLines.length} open pairs on ${new Set(targets.benchLines.map((l) => l.ticketId)).size} tickets`,
    );
    console.log(
      `Node ${process.version}, ${cpus().length} cores (${cpus()[0]?.model ?? 'unknown CPU'}); ` +
        `load average before: ${load.map((value) => value.toFixed(2)).join(', ')}`,
    );
    const kinds = kindRows(records, results);
    console.table(kinds);
    console.table(routeRows(records, results));
    console.log(
      `Database connections (pg_stat_activity on this database, polled each second, ${connections.samples} samples): ` +
        `max ${connections.max}, mean ${connections.mean.toFixed(1)}`,
    );

    const failures = records.flatMap((record) => record.failures);
    const all = kinds.find((row) => row.kind === 'all')!;
    const errors = reads.errors + writes.errors;
    // autocannon stops at the deadline without waiting: requests still open then are in no figure above.
    const open = reads.requests.sent + writes.requests.sent - all.requests - errors;
    if (open > 0) console.log(`Requests still open when the run stopped (in no figure above): ${open}`);
    if (failures.length > 0) console.log(`First failing answers:\n  ${failures.join('\n  ')}`);
    if (all.non2xx > 0 || errors > 0) {
      console.log(`FAILED: ${all.non2xx} non-2xx answers and ${errors} errors (timeouts included); both must be 0.`);
      process.exitCode = 1;
    }
  } finally {
    sessions.stop();
    await db.destroy();
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? (error.stack ?? error.message) : error);
  process.exitCode = 1;
});

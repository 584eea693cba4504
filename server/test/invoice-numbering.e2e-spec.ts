import type { INestApplication } from '@nestjs/common';
import { fork, type ChildProcess } from 'node:child_process';
import { join } from 'node:path';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import type { Actor } from '../src/auth/actor';
import { InvoicesService } from '../src/invoices/invoices.service';
import {
  businessToday,
  createCustomer,
  createInvoice,
  createStop,
  createToInvoiceTicket,
  ensureRateCard,
  invoiceActors,
  issueInvoice,
} from './utils/invoice-fixtures';
import type { WorkerJob, WorkerMessage } from './utils/issue-invoices-worker';
import { createTestApp } from './utils/test-app';

const PER_WORKER = 6;
const SERVER_ROOT = join(__dirname, '..');

/** One more server process, booted from the TypeScript sources with ts-node (decorator metadata included). */
function startWorker(job: WorkerJob): { child: ChildProcess; ready: Promise<void>; done: Promise<string[]> } {
  const child = fork(join(__dirname, 'utils', 'issue-invoices-worker.ts'), [], {
    cwd: SERVER_ROOT,
    execArgv: ['-r', 'ts-node/register/transpile-only'],
    env: {
      ...process.env,
      TS_NODE_PROJECT: join(SERVER_ROOT, 'tsconfig.json'),
      ISSUE_WORKER_JOB: JSON.stringify(job),
      JOBS_WORKERS: 'off',
    },
    stdio: ['ignore', 'ignore', 'pipe', 'ipc'],
  });
  let stderr = '';
  child.stderr?.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
  const messages = (want: 'ready' | 'numbers') =>
    new Promise<WorkerMessage>((resolve, reject) => {
      child.on('message', (message: WorkerMessage) => {
        if ('error' in message) reject(new Error(`worker failed: ${message.error}`));
        else if (want in message) resolve(message);
      });
      child.on('exit', (code) => reject(new Error(`worker exited with ${code} before "${want}": ${stderr}`)));
    });
  return {
    child,
    ready: messages('ready').then(() => undefined),
    done: messages('numbers').then((message) => ('numbers' in message ? message.numbers : [])),
  };
}

const sequenceOf = (number: string) => Number(number.split('-')[2]);

/**
 * Gapless numbering under two server processes: both issue invoices at the same moment against one database, and
 * the numbers come out distinct and consecutive; an issue rolled back hands its number back.
 */
describe('invoice numbering (e2e, two processes)', () => {
  let app: INestApplication<App>;
  let db: DataSource;
  let actors: Awaited<ReturnType<typeof invoiceActors>>;
  let office: Actor;
  let customerId: string;
  let year: number;
  const lastNumber = async () => {
    const [row] = await db.query<{ last_number: number }[]>(
      `SELECT last_number FROM document_counters WHERE series = 'KR' AND year = $1`,
      [year],
    );
    return row?.last_number ?? 0;
  };
  const toInvoice = () => createToInvoiceTicket(app, actors.tokens.office, { customerId });

  beforeAll(async () => {
    app = await createTestApp();
    db = app.get(DataSource);
    actors = await invoiceActors(app, ['owner', 'office']);
    await ensureRateCard(app, actors.tokens.owner);
    const stop = await createStop(app, actors.tokens.office, { taxRateBp: 700 });
    customerId = (await createCustomer(app, actors.tokens.office, { stopId: stop.id })).id;
    year = Number(businessToday(app).slice(0, 4));
    office = { id: actors.ids.office, email: actors.emails.office, name: 'E2E office', role: 'office' };
  });
  afterAll(async () => {
    await app.close();
  });

  it('gives two processes issuing at once distinct, consecutive numbers', async () => {
    const tickets = [];
    for (let i = 0; i < 2 * PER_WORKER; i++) tickets.push((await toInvoice()).id);
    const before = await lastNumber();
    const workers = [
      startWorker({ actor: office, ticketIds: tickets.slice(0, PER_WORKER) }),
      startWorker({ actor: office, ticketIds: tickets.slice(PER_WORKER) }),
    ];
    try {
      await Promise.all(workers.map((worker) => worker.ready));
      for (const worker of workers) worker.child.send('go');
      const [first, second] = await Promise.all(workers.map((worker) => worker.done));
      const all = [...first!, ...second!];
      expect(all).toHaveLength(2 * PER_WORKER);
      for (const number of all) expect(number).toMatch(new RegExp(`^KR-${year}-\\d{4,}$`));
      expect(new Set(all).size).toBe(all.length);
      const sequence = all.map(sequenceOf).sort((a, b) => a - b);
      expect(sequence).toEqual(Array.from({ length: all.length }, (_, i) => before + 1 + i));
      const stored = await db.query<{ number: string }[]>(
        `SELECT number FROM invoices WHERE id IN (SELECT invoice_id FROM tickets WHERE id = ANY($1::uuid[]))`,
        [tickets],
      );
      expect(stored.map((row) => row.number).sort()).toEqual([...all].sort());
    } finally {
      for (const worker of workers) if (worker.child.exitCode === null) worker.child.kill();
    }
  }, 180_000);

  it('hands the number of a rolled-back issue back to the next one', async () => {
    const draft = await createInvoice(app, actors.tokens.office, [(await toInvoice()).id]);
    const before = await lastNumber();
    const service = app.get(InvoicesService);
    let numbered: string | null = null;
    await expect(
      db.transaction(async (manager) => {
        numbered = (await service.issue(office, draft.id, manager)).number;
        throw new Error('the send failed after issuing');
      }),
    ).rejects.toThrow('the send failed');
    expect(numbered).toBe(`KR-${year}-${String(before + 1).padStart(4, '0')}`);
    expect(await lastNumber()).toBe(before);
    const still = await db.query<{ status: string; number: string | null }[]>(
      'SELECT status, number FROM invoices WHERE id = $1',
      [draft.id],
    );
    expect(still).toEqual([{ status: 'draft', number: null }]);

    const issued = await issueInvoice(app, actors.tokens.office, draft.id);
    expect(issued.number).toBe(numbered);
  });
});

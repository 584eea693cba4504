/**
 * A server process killed in the middle of a job: the job runs again on the other instance and its effect happens once.
 * Two API processes share a database of their own and a slow SMTP relay; the one that starts delivering an invoice
 * e-mail is killed (SIGKILL) before the relay answers, and the survivor delivers it once the job's expiry frees it.
 */
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import {
  eventually,
  invoicesToSend,
  openMailJobs,
  outboxRows,
  type InvoicesToSend,
} from './utils/faults/fault-fixtures';
import { createScratchDatabase, type ScratchDatabase } from './utils/faults/scratch-database';
import { SmtpRelay } from './utils/faults/smtp-relay';
import { startApiInstances, stopApiInstances, type ApiInstance } from './utils/instances/api-instances';
import { instanceApp } from './utils/instances/instance-app';

/** The relay answers this long after a message's last byte: time enough to kill the sender mid-delivery. */
const RELAY_ANSWER_MS = 2500;
/** A job held longer than this by a worker that is gone is failed by pg-boss's maintenance, then retried. */
const JOB_EXPIRE_SECONDS = 5;

describe('faults: a server killed in the middle of a job (e2e, two processes)', () => {
  let scratch: ScratchDatabase;
  let instances: ApiInstance[] = [];
  let app: INestApplication<App>;
  let fixtures: InvoicesToSend;
  const relay = new SmtpRelay(0, { answerAfterMs: RELAY_ANSWER_MS });

  beforeAll(async () => {
    await relay.start();
    scratch = await createScratchDatabase('faults_kill');
    instances = await startApiInstances(['A', 'B'], {
      DATABASE_URL: scratch.url,
      SMTP_PORT: String(relay.port),
      JOBS_WORKERS: 'on',
      MAIL_RETRY_DELAY_SECONDS: '1',
      MAIL_JOB_EXPIRE_SECONDS: String(JOB_EXPIRE_SECONDS),
      JOBS_MAINTENANCE_SECONDS: '1',
      // Info, so the test can read which instance started the delivery.
      LOG_LEVEL: 'info',
    });
    app = instanceApp(instances[0]!, scratch.db);
    fixtures = await invoicesToSend(app, 1);
  }, 180_000);

  afterAll(async () => {
    await stopApiInstances(instances);
    await relay.stop();
    await scratch?.drop();
  }, 40_000);

  it('delivers the e-mail of a killed worker from the other instance, once, and logs it sent once', async () => {
    const { actors, customer, drafts } = fixtures;
    const office = { Authorization: `Bearer ${actors.tokens.office}` };
    const [draft] = drafts;
    const sent = await request(app.getHttpServer())
      .post(`/api/invoices/${draft!.id}/send`)
      .set(office)
      .send({})
      .expect(202);
    const [row] = await outboxRows(scratch.db);
    const started = (instance: ApiInstance) =>
      instance.logs('e-mail delivery started').some((line) => line.outboxId === row!.id);

    // Whichever instance took the job is mid-delivery: the relay has the message and has not answered yet.
    const worker = await eventually('an instance to start delivering', () =>
      Promise.resolve(relay.waiting > 0 ? instances.find(started) : undefined),
    );
    const survivor = instances.find((instance) => instance !== worker)!;
    worker.child.kill('SIGKILL');
    await new Promise((resolve) => worker.child.once('exit', resolve));

    // The survivor takes the job once it has expired, and the relay accepts the message from it.
    await relay.waitForAccepted(1, 40_000);
    await eventually('the mail queue to drain', async () =>
      (await openMailJobs(scratch.db)) === 0 ? true : undefined,
    );
    expect(started(survivor)).toBe(true);
    expect(survivor.logs('e-mail sent').filter((line) => line.outboxId === row!.id)).toHaveLength(1);

    // One e-mail: the killed sender's copy was never acknowledged, so the relay did not keep it.
    expect(relay.abandoned).toBe(1);
    expect(relay.accepted).toHaveLength(1);
    expect(relay.accepted[0]).toMatchObject({ to: [customer.email] });
    expect(relay.accepted[0]!.subject).toMatch(new RegExp(`^Invoice ${sent.body.number} from`));
    // One row each: the outbox message sent on its first completed try (the killed one rolled back), one log entry.
    expect(await outboxRows(scratch.db)).toEqual([expect.objectContaining({ status: 'sent', attempts: 1 })]);
    const log = await scratch.db.query<{ status: string }[]>(`SELECT status FROM invoice_mails WHERE invoice_id = $1`, [
      draft!.id,
    ]);
    expect(log).toEqual([{ status: 'sent' }]);
  }, 90_000);
});

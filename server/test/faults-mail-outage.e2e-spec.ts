/**
 * The mail relay down: e-mails wait in the queue and go out once it is back, each exactly once. One API process on a
 * database of its own (so no other test's server works its queue) sends to an SMTP relay this test stops and starts
 * again on the same port; the relay counts what it accepted.
 */
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import type { InvoiceDto } from '../src/invoices/dto/invoice-response.dto';
import { MAIL_SEND_QUEUE } from '../src/mail/mail-outbox';
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
import { sendJobs } from './utils/instances/job-queue';

const INVOICES = 3;

describe('faults: the mail relay is down (e2e, one API process)', () => {
  let scratch: ScratchDatabase;
  let instances: ApiInstance[] = [];
  let app: INestApplication<App>;
  let fixtures: InvoicesToSend;
  const relay = new SmtpRelay();

  beforeAll(async () => {
    // Started once for a port of its own, then down from the start: the test's mails meet a refused connection.
    await relay.start();
    await relay.stop();
    scratch = await createScratchDatabase('faults_mail');
    instances = await startApiInstances(['mail'], {
      DATABASE_URL: scratch.url,
      SMTP_PORT: String(relay.port),
      JOBS_WORKERS: 'on',
      // Retries after about 1, 2, 4 … seconds instead of 30, 60, 120 …: the same backoff, at test speed.
      MAIL_RETRY_DELAY_SECONDS: '1',
      LOG_LEVEL: 'warn',
    });
    app = instanceApp(instances[0]!, scratch.db);
    fixtures = await invoicesToSend(app, INVOICES);
  }, 180_000);

  afterAll(async () => {
    await stopApiInstances(instances);
    await relay.stop();
    await scratch?.drop();
  }, 40_000);

  it('queues while the relay is down, sends every e-mail once when it is back, and logs each as sent', async () => {
    const { actors, customer, drafts } = fixtures;
    const http = () => request(app.getHttpServer());
    const office = { Authorization: `Bearer ${actors.tokens.office}` };

    // The office sends three invoices and someone asks for a password reset, all with the relay down.
    const sent: InvoiceDto[] = [];
    for (const draft of drafts) {
      const response = await http().post(`/api/invoices/${draft.id}/send`).set(office).send({}).expect(202);
      sent.push(response.body as InvoiceDto);
    }
    await http().post('/api/auth/password-reset').send({ email: actors.emails.office }).expect(202);
    for (const invoice of sent) {
      // Issued at once; "sent on" only once a relay has taken it.
      expect(invoice).toMatchObject({ status: 'sent', sentAt: null });
      const log = await http().get(`/api/invoices/${invoice.id}/mails`).set(office).expect(200);
      expect(log.body).toEqual([expect.objectContaining({ kind: 'invoice', status: 'queued' })]);
    }

    // A message queued twice: two more jobs for one outbox row, as a duplicated queue entry would be.
    const rows = await outboxRows(scratch.db);
    expect(rows).toHaveLength(INVOICES + 1);
    await sendJobs(scratch.url, MAIL_SEND_QUEUE, [{ outboxId: rows[0]!.id }, { outboxId: rows[0]!.id }]);

    // Every message is tried and refused (connection refused) and stays queued, with the reason on record.
    const refused = await eventually('every e-mail tried against the relay that is down', async () => {
      const now = await outboxRows(scratch.db);
      return now.every((row) => row.attempts >= 1) ? now : undefined;
    });
    for (const row of refused) expect(row).toMatchObject({ status: 'queued', lastError: expect.any(String) });
    expect(relay.accepted).toHaveLength(0);
    const waiting = await http().get(`/api/invoices/${sent[0]!.id}/mails`).set(office).expect(200);
    expect(waiting.body[0]).toMatchObject({ status: 'queued', error: expect.stringMatching(/ECONNREFUSED/) });

    // The relay comes back on the same port: the retries deliver everything.
    await relay.start();
    await relay.waitForAccepted(INVOICES + 1, 60_000);
    // Then the queue drains, the duplicate jobs included, and nothing more arrives.
    await eventually('the mail queue to drain', async () =>
      (await openMailJobs(scratch.db)) === 0 ? true : undefined,
    );
    expect(relay.accepted).toHaveLength(INVOICES + 1);

    const subjects = relay.accepted.map((mail) => mail.subject).sort();
    expect(new Set(subjects).size).toBe(INVOICES + 1);
    for (const invoice of sent) {
      const mail = relay.accepted.find((m) => m.subject.startsWith(`Invoice ${invoice.number} from`));
      expect(mail?.to).toEqual([customer.email]);
      // The PDF is drawn when the message goes out, from the invoice id the queue kept.
      expect(mail?.attachments).toEqual([{ filename: `${invoice.number}.pdf`, size: expect.any(Number) }]);
      expect(mail!.attachments[0]!.size).toBeGreaterThan(1000);
      const after = (await http().get(`/api/invoices/${invoice.id}`).set(office).expect(200)).body as InvoiceDto;
      expect(after.sentAt).not.toBeNull();
      const log = await http().get(`/api/invoices/${invoice.id}/mails`).set(office).expect(200);
      expect(log.body).toEqual([expect.objectContaining({ status: 'sent', error: null })]);
    }
    expect(relay.accepted.filter((mail) => mail.to.includes(actors.emails.office))).toHaveLength(1);

    // Each row went once, after at least one refused try; its body (a reset link among them) is gone.
    for (const row of await outboxRows(scratch.db)) {
      expect(row).toMatchObject({ status: 'sent', lastError: null, text: '' });
      expect(row.attempts).toBeGreaterThanOrEqual(2);
    }
  }, 120_000);
});

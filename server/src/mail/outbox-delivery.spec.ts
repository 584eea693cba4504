import type { ConfigService } from '@nestjs/config';
import type { DataSource, EntityManager } from 'typeorm';
import type { AppConfig } from '../config/environment';
import type { JobsService } from '../jobs/jobs.service';
import type { OutboxMail } from './entities/outbox-mail.entity';
import { MAIL_MAX_ATTEMPTS, MailOutbox } from './mail-outbox';
import type { DeliveryResult, MailService } from './mail.service';
import { OutboxDelivery } from './outbox-delivery';

const queuedRow = (overrides: Partial<OutboxMail> = {}): OutboxMail => ({
  id: 'mail-1',
  key: 'invoice-mail:log-1',
  topic: 'invoice-mail',
  refId: 'log-1',
  toEmail: 'wren@demo.keenroute.test',
  toName: null,
  subject: 'Invoice KR-2026-0001',
  text: 'Your invoice',
  html: null,
  attachment: { kind: 'invoice-pdf', id: 'inv-1' },
  status: 'queued',
  attempts: 0,
  lastError: null,
  sentAt: null,
  createdAt: new Date(),
  ...overrides,
});

/** One outbox row in memory behind the few EntityManager calls the delivery makes. */
function fakeDatabase(row: OutboxMail | null) {
  let stored = row ? { ...row } : null;
  const manager = {
    createQueryBuilder: () => {
      const chain = {
        setLock: () => chain,
        setOnLocked: () => chain,
        where: () => chain,
        andWhere: () => chain,
        getOne: () => Promise.resolve(stored?.status === 'queued' ? { ...stored } : null),
      };
      return chain;
    },
    update: jest.fn((_entity: unknown, _id: string, changes: Partial<OutboxMail>) => {
      stored = { ...stored!, ...changes };
      return Promise.resolve();
    }),
    findOneByOrFail: () => Promise.resolve({ ...stored! }),
  } as unknown as EntityManager;
  const dataSource = {
    transaction: (work: (m: EntityManager) => Promise<unknown>) => work(manager),
  } as unknown as DataSource;
  return { dataSource, manager, row: () => stored };
}

function setUp(row: OutboxMail | null, result: DeliveryResult) {
  const database = fakeDatabase(row);
  const config = { get: (key: string) => (key === 'MAIL_RETRY_DELAY_SECONDS' ? 30 : 300) };
  const outbox = new MailOutbox(
    database.dataSource,
    {} as JobsService,
    config as unknown as ConfigService<AppConfig, true>,
  );
  const outcome = jest.fn(() => Promise.resolve());
  outbox.onOutcome('invoice-mail', outcome);
  const render = jest.fn(() =>
    Promise.resolve({ filename: 'KR-2026-0001.pdf', content: Buffer.from('%PDF'), contentType: 'application/pdf' }),
  );
  outbox.renderAttachments('invoice-pdf', render);
  const mail = { deliver: jest.fn(() => Promise.resolve(result)) };
  const sut = new OutboxDelivery(database.dataSource, outbox, mail as unknown as MailService);
  return { sut, mail, outcome, render, row: database.row };
}

describe('OutboxDelivery', () => {
  it('sends a queued message with its attachment drawn now, marks it sent, clears the body and tells the feature', async () => {
    const { sut, mail, outcome, render, row } = setUp(queuedRow(), { ok: true, messageId: '<1@relay>' });
    await expect(sut.deliver({ outboxId: 'mail-1' })).resolves.toBe('sent');
    expect(render).toHaveBeenCalledWith('inv-1', expect.anything());
    expect(mail.deliver).toHaveBeenCalledWith(
      expect.objectContaining({
        to: 'wren@demo.keenroute.test',
        attachments: [expect.objectContaining({ filename: 'KR-2026-0001.pdf' })],
      }),
    );
    expect(row()).toMatchObject({ status: 'sent', attempts: 1, text: '', html: null, lastError: null });
    expect(outcome).toHaveBeenCalledWith(expect.objectContaining({ status: 'sent' }), expect.anything());
  });

  it('keeps a refused message queued with the reason, so pg-boss tries it again', async () => {
    const { sut, outcome, row } = setUp(queuedRow({ attempts: 2 }), { ok: false, error: 'connect ECONNREFUSED' });
    await expect(sut.deliver({ outboxId: 'mail-1' })).resolves.toBe('retry');
    expect(row()).toMatchObject({
      status: 'queued',
      attempts: 3,
      lastError: 'connect ECONNREFUSED',
      text: 'Your invoice',
    });
    expect(outcome).toHaveBeenCalledWith(expect.objectContaining({ status: 'queued' }), expect.anything());
  });

  it('gives up after the last try: failed, with the reason, and the feature is told', async () => {
    const last = queuedRow({ attempts: MAIL_MAX_ATTEMPTS - 1 });
    const { sut, outcome, row } = setUp(last, { ok: false, error: '550 mailbox unavailable' });
    await expect(sut.deliver({ outboxId: 'mail-1' })).resolves.toBe('failed');
    expect(row()).toMatchObject({
      status: 'failed',
      attempts: MAIL_MAX_ATTEMPTS,
      lastError: '550 mailbox unavailable',
    });
    expect(outcome).toHaveBeenCalledWith(expect.objectContaining({ status: 'failed' }), expect.anything());
  });

  it('sends nothing for a message already sent (a second job for it)', async () => {
    const { sut, mail, outcome } = setUp(queuedRow({ status: 'sent', attempts: 1 }), { ok: true, messageId: 'x' });
    await expect(sut.deliver({ outboxId: 'mail-1' })).resolves.toBe('taken');
    expect(mail.deliver).not.toHaveBeenCalled();
    expect(outcome).not.toHaveBeenCalled();
  });
});

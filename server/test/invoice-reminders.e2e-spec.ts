import type { INestApplication } from '@nestjs/common';
import { addDays, formatMoney } from '@keenroute/shared';
import { simpleParser } from 'mailparser';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import type { BusinessProfileDto } from '../src/invoices/documents/dto/business-profile.dto';
import type { InvoiceDto } from '../src/invoices/dto/invoice-response.dto';
import { InvoiceReminder } from '../src/invoices/entities/invoice-reminder.entity';
import { InvoicePayLink } from '../src/invoices/invoice-pay-link';
import { InvoiceReminderSender, REMINDER_MAX_ATTEMPTS } from '../src/invoices/reminders/invoice-reminder-sender';
import { InvoiceRemindersService } from '../src/invoices/reminders/invoice-reminders.service';
import { MailService } from '../src/mail/mail.service';
import {
  businessToday,
  createCustomer,
  createIssuedInvoice,
  createStop,
  createToInvoiceTicket,
  ensureRateCard,
  invoiceActors,
  type ActorName,
  type CustomerRef,
  type StopRef,
} from './utils/invoice-fixtures';
import { mailTo, type CaughtMail } from './utils/mail-catcher';
import { createTestApp } from './utils/test-app';
import { pdfText } from './utils/binary';

/** The nodemailer transport inside MailService, as far as the relay-failure test needs it. */
type Sender = { sendMail(mail: unknown): Promise<unknown> };
interface ReminderRunBody {
  today: string;
  queued: number;
  skipped: number;
  sent: number;
  cancelled: number;
  failed: number;
}

/** Polls until `check` returns a value, or fails after the timeout: queued jobs run on pg-boss's own schedule. */
async function eventually<T>(what: string, check: () => Promise<T | undefined>, timeoutMs = 20_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await check();
    if (value !== undefined) return value;
    if (Date.now() > deadline) throw new Error(`Timed out waiting for ${what}.`);
    await new Promise((resolve) => setTimeout(resolve, 150));
  }
}

const money = (cents: number) => formatMoney(cents, 'USD');

/**
 * Reminders for overdue invoices through the real database, pg-boss and the local mail catcher. An invoice is made
 * overdue by moving its due date into the past straight in the database (a test shortcut: the app sets due dates from
 * the payment terms, and nobody waits weeks in a test); reminders then go out through the office's "run now" route.
 */
describe('invoice reminders (e2e)', () => {
  let app: INestApplication<App>;
  let db: DataSource;
  let actors: Awaited<ReturnType<typeof invoiceActors>>;
  let original: BusinessProfileDto;
  let salon: StopRef;
  let today: string;
  const http = () => request(app.getHttpServer());
  const as = (who: ActorName) => actors.as(who);

  const run = async (who: ActorName = 'office') =>
    (await http().post('/api/invoices/reminders/run').set(as(who)).expect(200)).body as ReminderRunBody;
  const remindersOf = (invoiceId: string) =>
    db.getRepository(InvoiceReminder).find({ where: { invoiceId }, order: { stageDays: 'ASC' } });
  const stages = async (invoiceId: string) =>
    (await remindersOf(invoiceId)).map((r) => [r.stageDays, r.status] as [number, string]);
  const mailsOf = (customer: CustomerRef): Promise<CaughtMail[]> => mailTo(customer.email!);
  /** Test shortcut: the due date moved into the past in the database, `days` before today. */
  const makeOverdue = (invoiceId: string, days: number) =>
    db.query(`UPDATE invoices SET due_date = $2::date WHERE id = $1`, [invoiceId, addDays(today, -days)]);
  /** An issued invoice for a new customer (with an e-mail unless told), `days` past its due date. */
  const overdueInvoice = async (days: number, email?: null) => {
    const customer = await createCustomer(app, actors.tokens.office, { stopId: salon.id, email });
    const ticket = await createToInvoiceTicket(app, actors.tokens.office, {
      customerId: customer.id,
      shears: [{}, {}],
    });
    const invoice = await createIssuedInvoice(app, actors.tokens.office, [ticket.id]);
    await makeOverdue(invoice.id, days);
    return { customer, invoice };
  };
  const pay = (invoice: InvoiceDto, amountCents: number) =>
    http()
      .post(`/api/invoices/${invoice.id}/payments`)
      .set(as('office'))
      .send({ method: 'cash', amountCents })
      .expect(201);

  beforeAll(async () => {
    app = await createTestApp();
    db = app.get(DataSource);
    actors = await invoiceActors(app, ['owner', 'office', 'sharpener', 'client']);
    await ensureRateCard(app, actors.tokens.owner);
    today = businessToday(app);
    original = (await http().get('/api/business-profile').set(as('owner')).expect(200)).body as BusinessProfileDto;
    await http()
      .put('/api/business-profile')
      .set(as('owner'))
      .send({ name: 'Larkhaven Edge Works (demo)', reminderDays: [7, 21, 45] })
      .expect(200);
    salon = await createStop(app, actors.tokens.office, { taxRateBp: 825, name: 'Reminder Salon (demo)' });
  });

  afterAll(async () => {
    // The profile is one row every test file shares: leave it as it was found.
    await http().put('/api/business-profile').set(as('owner')).send({
      name: original.name,
      reminderDays: original.reminderDays,
    });
    await app.close();
  });

  describe('sending', () => {
    let customer: CustomerRef;
    let invoice: InvoiceDto;

    beforeAll(async () => {
      ({ customer, invoice } = await overdueInvoice(8));
    });

    it('sends the due stage with the invoice PDF attached and the pay link', async () => {
      expect(await run()).toMatchObject({ today });
      expect(await stages(invoice.id)).toEqual([[7, 'sent']]);
      const [reminder] = await remindersOf(invoice.id);
      expect(reminder).toMatchObject({ attempts: 1, lastError: null });
      expect(reminder!.sentAt).toBeInstanceOf(Date);

      const caught = await mailsOf(customer);
      expect(caught).toHaveLength(1);
      const raw = await fetch(`${process.env.MAIL_CATCHER_URL}/messages/${caught[0]!.id}/raw`);
      const parsed = await simpleParser(Buffer.from(await raw.arrayBuffer()));
      expect(parsed.subject).toBe(`Reminder: invoice ${invoice.number} is 8 days overdue`);
      const payUrl = app.get(InvoicePayLink).url(invoice.id);
      expect(parsed.text).toContain(payUrl);
      expect(parsed.html || '').toContain(`href="${payUrl}"`);
      expect(parsed.text).toContain(`was due on ${addDays(today, -8)}, 8 days ago.`);
      expect(parsed.text).toContain(`${money(invoice.totalCents)} is still owed on it.`);
      expect(parsed.attachments).toHaveLength(1);
      const [attachment] = parsed.attachments;
      expect(attachment!.filename).toBe(`${invoice.number}.pdf`);
      expect(attachment!.contentType).toBe('application/pdf');
      expect(await pdfText(attachment!.content)).toContain(`Invoice ${invoice.number}`);

      const log = await http().get(`/api/invoices/${invoice.id}/mails`).set(as('office')).expect(200);
      expect(log.body).toEqual(
        expect.arrayContaining([
          expect.objectContaining({ kind: 'reminder', status: 'sent', toEmail: customer.email }),
        ]),
      );
    });

    it('sends nothing more when run again, twice at once, or the job runs again', async () => {
      await run();
      await Promise.all([run(), run('owner')]);
      const [reminder] = await remindersOf(invoice.id);
      await expect(app.get(InvoiceReminderSender).deliver({ reminderId: reminder!.id })).resolves.toBe('taken');
      expect(await stages(invoice.id)).toEqual([[7, 'sent']]);
      expect(await mailsOf(customer)).toHaveLength(1);
    });

    it('sends a newly due stage once when three runs start at the same moment', async () => {
      const fresh = await overdueInvoice(9);
      const runs = await Promise.all([run(), run(), run('owner')]);
      expect(runs.reduce((sum, r) => sum + r.queued, 0)).toBeGreaterThanOrEqual(1);
      expect(runs.reduce((sum, r) => sum + r.sent, 0)).toBeGreaterThanOrEqual(1);
      expect(await stages(fresh.invoice.id)).toEqual([[7, 'sent']]);
      expect(await mailsOf(fresh.customer)).toHaveLength(1);
    });

    it('sends a stage queued by the schedule through the pg-boss send queue, once', async () => {
      const queuedOne = await overdueInvoice(10);
      const reminders = app.get(InvoiceRemindersService);
      const queued = await reminders.queueDue(today);
      expect(queued.jobs).toBeGreaterThanOrEqual(1);
      await eventually('the queued reminder to be sent', async () => {
        const rows = await remindersOf(queuedOne.invoice.id);
        return rows[0]?.status === 'sent' ? rows : undefined;
      });
      await run();
      expect(await mailsOf(queuedOne.customer)).toHaveLength(1);
    });
  });

  describe('stages', () => {
    it('sends only the latest stage when several are due at once, then the final one later', async () => {
      const { customer, invoice } = await overdueInvoice(30);
      const first = await run();
      expect(first.skipped).toBeGreaterThanOrEqual(1);
      expect(await stages(invoice.id)).toEqual([
        [7, 'skipped'],
        [21, 'sent'],
      ]);
      expect((await mailsOf(customer)).map((m) => m.subject)).toEqual([
        `Reminder: invoice ${invoice.number} is 30 days overdue`,
      ]);

      await makeOverdue(invoice.id, 46);
      await run();
      await run();
      expect(await stages(invoice.id)).toEqual([
        [7, 'skipped'],
        [21, 'sent'],
        [45, 'sent'],
      ]);
      const subjects = (await mailsOf(customer)).map((m) => m.subject);
      expect(subjects).toHaveLength(2);
      expect(subjects).toContain(`Final reminder: invoice ${invoice.number} is 46 days overdue`);
    });

    it('passes over a stage still waiting when a later one falls due', async () => {
      const { customer, invoice } = await overdueInvoice(8);
      await app.get(InvoiceRemindersService).stageDue(today);
      expect(await stages(invoice.id)).toEqual([[7, 'pending']]);
      await makeOverdue(invoice.id, 22);
      await run();
      expect(await stages(invoice.id)).toEqual([
        [7, 'skipped'],
        [21, 'sent'],
      ]);
      expect((await mailsOf(customer)).map((m) => m.subject)).toEqual([
        `Reminder: invoice ${invoice.number} is 22 days overdue`,
      ]);
    });

    it('sends nothing before the first stage', async () => {
      const { customer, invoice } = await overdueInvoice(6);
      await run();
      expect(await stages(invoice.id)).toEqual([]);
      expect(await mailsOf(customer)).toHaveLength(0);
    });
  });

  describe('stopping', () => {
    it('cancels a waiting reminder once the invoice is paid, and makes no new stage for it', async () => {
      const { customer, invoice } = await overdueInvoice(8);
      await app.get(InvoiceRemindersService).stageDue(today);
      expect(await stages(invoice.id)).toEqual([[7, 'pending']]);
      await pay(invoice, invoice.balanceCents);
      expect((await run()).cancelled).toBeGreaterThanOrEqual(1);
      expect(await stages(invoice.id)).toEqual([[7, 'cancelled']]);

      await makeOverdue(invoice.id, 30);
      await run();
      expect(await stages(invoice.id)).toEqual([[7, 'cancelled']]);
      expect(await mailsOf(customer)).toHaveLength(0);
    });

    it('cancels a waiting reminder once the invoice is void', async () => {
      const { customer, invoice } = await overdueInvoice(8);
      await app.get(InvoiceRemindersService).stageDue(today);
      await http()
        .post(`/api/invoices/${invoice.id}/void`)
        .set(as('office'))
        .send({ reason: 'Billed to the wrong salon (demo)' })
        .expect(200);
      await run();
      expect(await stages(invoice.id)).toEqual([[7, 'cancelled']]);
      expect(await mailsOf(customer)).toHaveLength(0);
    });

    it('still reminds a part-paid invoice, for what is left', async () => {
      const { customer, invoice } = await overdueInvoice(8);
      await pay(invoice, 500);
      await run();
      expect(await stages(invoice.id)).toEqual([[7, 'sent']]);
      const [mail] = await mailsOf(customer);
      expect(mail!.text).toContain(`${money(invoice.totalCents - 500)} is still owed on it.`);
      expect(mail!.text).toContain(`Thank you for the ${money(500)} already received or credited.`);
    });
  });

  describe('failures', () => {
    it('records a refused send for a retry, then fails it for good after the last try', async () => {
      const { customer, invoice } = await overdueInvoice(8);
      const transport = app.get<MailService, { transport: Sender }>(MailService).transport;
      const refuse = jest
        .spyOn(transport, 'sendMail')
        .mockRejectedValue(new Error('Greeting never received (test relay down)'));
      try {
        expect((await run()).failed).toBeGreaterThanOrEqual(1);
        const [waiting] = await remindersOf(invoice.id);
        expect(waiting).toMatchObject({ stageDays: 7, status: 'pending', attempts: 1 });
        expect(waiting!.lastError).toContain('Greeting never received');
        const log = await http().get(`/api/invoices/${invoice.id}/mails`).set(as('office')).expect(200);
        expect(log.body[0]).toMatchObject({ kind: 'reminder', status: 'failed' });

        // Test shortcut: the tries pg-boss would make over half an hour, counted straight in the row.
        await db.getRepository(InvoiceReminder).update(waiting!.id, { attempts: REMINDER_MAX_ATTEMPTS - 1 });
        await run();
        expect(await remindersOf(invoice.id)).toEqual([
          expect.objectContaining({ status: 'failed', attempts: REMINDER_MAX_ATTEMPTS }),
        ]);
      } finally {
        refuse.mockRestore();
      }
      await run();
      expect(await stages(invoice.id)).toEqual([[7, 'failed']]);
      expect(await mailsOf(customer)).toHaveLength(0);
    });

    it('fails a reminder for an invoice without an e-mail address, saying so', async () => {
      const { invoice } = await overdueInvoice(8, null);
      await run();
      const [reminder] = await remindersOf(invoice.id);
      expect(reminder).toMatchObject({ stageDays: 7, status: 'failed' });
      expect(reminder!.lastError).toMatch(/has no e-mail address/);
    });
  });

  it('lets only the owner and the office run reminders', async () => {
    await http().post('/api/invoices/reminders/run').set(as('sharpener')).expect(403);
    await http().post('/api/invoices/reminders/run').set(as('client')).expect(403);
    await http().post('/api/invoices/reminders/run').expect(401);
    await http().post('/api/invoices/reminders/run').set(as('owner')).send({ today: '2030-01-01' }).expect(400);
  });
});

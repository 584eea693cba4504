import { Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, EntityManager } from 'typeorm';
import type { AppConfig } from '../../config/environment';
import { todayIn } from '../../stops/business-today';
import { InvoiceMailer } from '../documents/invoice-mailer';
import { InvoicePdfService } from '../documents/invoice-pdf.service';
import { InvoiceReminder } from '../entities/invoice-reminder.entity';
import { Invoice } from '../entities/invoice.entity';
import { balanceCents, daysOverdue } from '../invoice-balance';
import { reminderMail } from './reminder-mail';
import { isFinalStage } from './reminder-stages';

/** What one 'invoice-reminder-send' job carries. */
export interface ReminderJob {
  reminderId: string;
}

/**
 * How one try went. taken: already sent, cancelled or failed, or another worker holds it right now; retry: the mail
 * relay refused it and the row stays pending for the next try.
 */
export type ReminderOutcome = 'sent' | 'cancelled' | 'failed' | 'retry' | 'taken';

/** The send queue's retry limit: with the first try, a reminder is tried this many times before it is 'failed'. */
export const REMINDER_RETRY_LIMIT = 5;
export const REMINDER_MAX_ATTEMPTS = REMINDER_RETRY_LIMIT + 1;

/** Thrown after the failed try is recorded, so pg-boss tries the job again later. */
export class ReminderSendFailed extends Error {
  constructor(job: ReminderJob, reason: string) {
    super(`Invoice reminder ${job.reminderId} could not be sent (${reason}); pg-boss retries.`);
    this.name = 'ReminderSendFailed';
  }
}

const stillOwed = (invoice: Invoice) =>
  (invoice.status === 'sent' || invoice.status === 'part-paid') && balanceCents(invoice) > 0;

/**
 * Sends one reminder row exactly once: the row is unique per invoice and stage, and it is sent only while locked (FOR
 * UPDATE SKIP LOCKED) and still 'pending', so two jobs, the run route and a job, or two app instances never both send
 * it. The invoice is read again inside that lock: paid or void since the row was made means 'cancelled', not sent.
 */
@Injectable()
export class InvoiceReminderSender {
  private readonly logger = new Logger(InvoiceReminderSender.name);
  private readonly timeZone: string;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly pdf: InvoicePdfService,
    private readonly mailer: InvoiceMailer,
    config: ConfigService<AppConfig, true>,
  ) {
    this.timeZone = config.get('BUSINESS_TIME_ZONE', { infer: true });
  }

  deliver(job: ReminderJob): Promise<ReminderOutcome> {
    return this.dataSource.transaction(async (manager) => {
      const reminder = await this.claim(manager, job.reminderId);
      if (!reminder) return 'taken';
      const invoice = await manager.getRepository(Invoice).findOneBy({ id: reminder.invoiceId });
      const where = { reminderId: reminder.id, invoiceId: reminder.invoiceId, stageDays: reminder.stageDays };
      if (!invoice || !stillOwed(invoice)) {
        await manager.update(InvoiceReminder, reminder.id, { status: 'cancelled' });
        this.logger.log(where, 'invoice reminder cancelled: paid or void since it was due');
        return 'cancelled';
      }
      if (!invoice.billToEmail) {
        // Retrying cannot help until someone adds an address; the office sees why in the reminder row.
        await manager.update(InvoiceReminder, reminder.id, {
          status: 'failed',
          attempts: reminder.attempts + 1,
          lastError: `Invoice ${invoice.number ?? invoice.id} has no e-mail address to send a reminder to.`,
        });
        this.logger.warn(where, 'invoice reminder failed: no e-mail address');
        return 'failed';
      }
      return this.send(manager, reminder, invoice.billToEmail);
    });
  }

  private async send(manager: EntityManager, reminder: InvoiceReminder, to: string): Promise<ReminderOutcome> {
    const rendered = await this.pdf.renderWithDocument(reminder.invoiceId, manager);
    const { invoice, profile } = rendered.document;
    const mail = reminderMail(rendered.document, {
      daysOverdue: daysOverdue(invoice.dueDate!, todayIn(this.timeZone)),
      final: isFinalStage(reminder.stageDays, profile.reminderDays),
    });
    const logged = await this.mailer.sendLogged({
      invoiceId: invoice.id,
      kind: 'reminder',
      to,
      ...mail,
      attachments: [{ filename: rendered.fileName, content: rendered.pdf, contentType: 'application/pdf' }],
    });
    const attempts = reminder.attempts + 1;
    // The log names the reminder and invoice, not the address: recipients are customers' personal data.
    const where = { reminderId: reminder.id, invoiceId: invoice.id, stageDays: reminder.stageDays, attempts };
    if (logged.status === 'sent') {
      await manager.update(InvoiceReminder, reminder.id, {
        status: 'sent',
        attempts,
        sentAt: new Date(),
        lastError: null,
      });
      this.logger.log(where, 'invoice reminder sent');
      return 'sent';
    }
    const final = attempts >= REMINDER_MAX_ATTEMPTS;
    await manager.update(InvoiceReminder, reminder.id, {
      status: final ? 'failed' : 'pending',
      attempts,
      lastError: logged.error ?? 'The mail server did not accept the message.',
    });
    this.logger.warn(where, final ? 'invoice reminder failed for good' : 'invoice reminder failed; tried again later');
    return final ? 'failed' : 'retry';
  }

  /** The row, locked for this transaction, unless it is no longer pending or another worker holds it. */
  private claim(manager: EntityManager, reminderId: string): Promise<InvoiceReminder | null> {
    return manager
      .createQueryBuilder(InvoiceReminder, 'reminder')
      .setLock('pessimistic_write')
      .setOnLocked('skip_locked')
      .where('reminder.id = :reminderId', { reminderId })
      .andWhere("reminder.status = 'pending'")
      .getOne();
  }
}

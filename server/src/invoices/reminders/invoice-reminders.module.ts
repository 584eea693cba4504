import { Module, type OnApplicationBootstrap } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { AppConfig } from '../../config/environment';
import { JobsService } from '../../jobs/jobs.service';
import { InvoiceDocumentsModule } from '../documents/invoice-documents.module';
import {
  InvoiceReminderSender,
  REMINDER_RETRY_LIMIT,
  ReminderSendFailed,
  type ReminderJob,
} from './invoice-reminder-sender';
import { InvoiceRemindersController } from './invoice-reminders.controller';
import { InvoiceRemindersService, REMINDER_SEND_QUEUE, REMINDERS_DUE_QUEUE } from './invoice-reminders.service';

/** Reminders for overdue invoices: a daily schedule, a send queue that retries, and the office's "run now". */
@Module({
  imports: [InvoiceDocumentsModule],
  controllers: [InvoiceRemindersController],
  providers: [InvoiceRemindersService, InvoiceReminderSender],
})
export class InvoiceRemindersModule implements OnApplicationBootstrap {
  constructor(
    private readonly jobs: JobsService,
    private readonly reminders: InvoiceRemindersService,
    private readonly sender: InvoiceReminderSender,
    private readonly config: ConfigService<AppConfig, true>,
  ) {}

  /** Queues, workers and the schedule; each instance registers them, pg-boss keeps one of each. */
  async onApplicationBootstrap(): Promise<void> {
    // A mail relay outage is retried for about half an hour: after 1 minute, then doubling with jitter, five times.
    await this.jobs.createQueue(REMINDER_SEND_QUEUE, {
      retryLimit: REMINDER_RETRY_LIMIT,
      retryDelay: 60,
      retryBackoff: true,
    });
    await this.jobs.createQueue(REMINDERS_DUE_QUEUE, { retryLimit: 2, retryDelay: 60 });
    await this.jobs.work<ReminderJob>(REMINDER_SEND_QUEUE, async (job) => {
      const outcome = await this.sender.deliver(job.data);
      if (outcome === 'retry') throw new ReminderSendFailed(job.data, 'the mail relay refused it');
    });
    await this.jobs.work(REMINDERS_DUE_QUEUE, async () => {
      await this.reminders.queueDue(this.reminders.today());
    });
    const cron = this.config.get('INVOICE_REMINDER_CRON', { infer: true });
    await this.jobs
      .schedule(REMINDERS_DUE_QUEUE, cron, this.config.get('BUSINESS_TIME_ZONE', { infer: true }))
      .catch((error: unknown) => {
        // pg-boss checks the expression; the message should name the variable to fix.
        throw new Error(`INVOICE_REMINDER_CRON: "${cron}" is not a cron expression pg-boss accepts (${String(error)})`);
      });
  }
}

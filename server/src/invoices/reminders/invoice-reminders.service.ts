import { Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import type { AppConfig } from '../../config/environment';
import { JobsService } from '../../jobs/jobs.service';
import { todayIn } from '../../stops/business-today';
import { BusinessProfileService } from '../documents/business-profile.service';
import { InvoiceReminderSender, type ReminderJob, type ReminderOutcome } from './invoice-reminder-sender';
import { planStages } from './reminder-stages';

export const REMINDERS_DUE_QUEUE = 'invoice-reminders-due';
export const REMINDER_SEND_QUEUE = 'invoice-reminder-send';

/** One send job per reminder and hour: queueing again within it adds nothing (the reminders table decides anyway). */
const SINGLETON_SECONDS = 3600;

export interface StagedReminders {
  /** Reminders made now and waiting to be sent. */
  queued: number;
  /** Earlier stages passed over now because a later one was due as well. */
  skipped: number;
}

export interface ReminderRun extends StagedReminders {
  today: string;
  sent: number;
  /** Waiting reminders whose invoice was paid or voided meanwhile. */
  cancelled: number;
  /** Tries the mail relay refused (kept for a retry) and reminders that cannot go (no address, out of tries). */
  failed: number;
}

/**
 * Reminders for overdue invoices, at the business profile's days after the due date. The invoice_reminders row, unique
 * per invoice and stage, is the record that a stage is owed; the sender makes sure each row's e-mail goes out once.
 */
@Injectable()
export class InvoiceRemindersService {
  private readonly logger = new Logger(InvoiceRemindersService.name);
  private readonly timeZone: string;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly jobs: JobsService,
    private readonly profiles: BusinessProfileService,
    private readonly sender: InvoiceReminderSender,
    config: ConfigService<AppConfig, true>,
  ) {
    this.timeZone = config.get('BUSINESS_TIME_ZONE', { infer: true });
  }

  today(): string {
    return todayIn(this.timeZone);
  }

  /**
   * Writes the reminder rows due on `today` for every issued invoice with something owed: the latest due stage as
   * 'pending', earlier ones as 'skipped'. Rows already there keep their status (ON CONFLICT DO NOTHING), so running
   * this twice, or twice at once, owes nothing twice; an earlier stage still waiting is passed over for the later one.
   */
  async stageDue(today: string): Promise<StagedReminders> {
    const { reminderDays } = await this.profiles.profile();
    const staged: StagedReminders = { queued: 0, skipped: 0 };
    if (reminderDays.length === 0) return staged;
    const overdue = await this.dataSource.query<{ id: string; dueDate: string }[]>(
      `SELECT id, to_char(due_date, 'YYYY-MM-DD') AS "dueDate" FROM invoices
        WHERE status IN ('sent', 'part-paid') AND due_date IS NOT NULL
          AND total_cents - paid_cents - credited_cents > 0 AND due_date + $1::int <= $2::date
        ORDER BY due_date, id`,
      [Math.min(...reminderDays), today],
    );
    for (const invoice of overdue) {
      const plan = planStages(invoice.dueDate, reminderDays, today);
      if (plan.send === null) continue;
      const inserted = await this.dataSource.query<{ status: string }[]>(
        `INSERT INTO invoice_reminders (invoice_id, stage_days, status)
         SELECT $1, stage, CASE WHEN stage = $2 THEN 'pending' ELSE 'skipped' END FROM unnest($3::smallint[]) AS stage
         ON CONFLICT (invoice_id, stage_days) DO NOTHING
         RETURNING status`,
        [invoice.id, plan.send, [...plan.skip, plan.send]],
      );
      // A row that waits behind a locked send is re-read after it commits: a reminder just sent stays 'sent'.
      const [, passedOver] = await this.dataSource.query<[unknown[], number]>(
        `UPDATE invoice_reminders SET status = 'skipped'
          WHERE invoice_id = $1 AND stage_days < $2 AND status = 'pending'`,
        [invoice.id, plan.send],
      );
      staged.queued += inserted.filter((row) => row.status === 'pending').length;
      staged.skipped += inserted.filter((row) => row.status === 'skipped').length + passedOver;
    }
    return staged;
  }

  /** The scheduled run: stage what is due and hand every waiting reminder to the send queue, which retries. */
  async queueDue(today: string): Promise<StagedReminders & { jobs: number }> {
    const staged = await this.stageDue(today);
    let jobs = 0;
    for (const reminderId of await this.pendingIds()) {
      const job: ReminderJob = { reminderId };
      const id = await this.jobs.send(REMINDER_SEND_QUEUE, job, {
        singletonKey: reminderId,
        singletonSeconds: SINGLETON_SECONDS,
      });
      if (id) jobs += 1;
    }
    this.logger.log({ today, ...staged, jobs }, 'invoice reminders queued');
    return { ...staged, jobs };
  }

  /**
   * The office's "run now": stages what is due and works every waiting reminder here and now, so the answer says
   * what happened. A send job working the same row at the same moment is harmless: whoever claims the row sends it.
   */
  async runNow(today: string = this.today()): Promise<ReminderRun> {
    const staged = await this.stageDue(today);
    const run: ReminderRun = { today, ...staged, sent: 0, cancelled: 0, failed: 0 };
    const tally: Record<ReminderOutcome, keyof ReminderRun | null> = {
      sent: 'sent',
      cancelled: 'cancelled',
      failed: 'failed',
      retry: 'failed',
      taken: null,
    };
    for (const reminderId of await this.pendingIds()) {
      const counter = tally[await this.sender.deliver({ reminderId })];
      if (counter) (run[counter] as number) += 1;
    }
    this.logger.log(run, 'invoice reminders run');
    return run;
  }

  private async pendingIds(): Promise<string[]> {
    const rows = await this.dataSource.query<{ id: string }[]>(
      `SELECT id FROM invoice_reminders WHERE status = 'pending' ORDER BY created_at, id`,
    );
    return rows.map((row) => row.id);
  }
}

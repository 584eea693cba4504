import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** pending → sent; skipped: a later stage was due as well; cancelled: paid or void before it went; failed: retries ran out. */
export const REMINDER_STATUSES = ['pending', 'sent', 'skipped', 'cancelled', 'failed'] as const;
export type ReminderStatus = (typeof REMINDER_STATUSES)[number];

/** One reminder stage of one overdue invoice; the unique (invoice, stage) row is what makes it go out once. */
@Entity({ name: 'invoice_reminders' })
export class InvoiceReminder {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'invoice_id', type: 'uuid' })
  invoiceId: string;

  /** Days after the due date (one of the business profile's reminder days). */
  @Column({ name: 'stage_days', type: 'smallint' })
  stageDays: number;

  @Column({ type: 'varchar', length: 16, default: 'pending' })
  status: ReminderStatus;

  @Column({ type: 'smallint', default: 0 })
  attempts: number;

  @Column({ name: 'last_error', type: 'varchar', length: 500, nullable: true })
  lastError: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @Column({ name: 'sent_at', type: 'timestamptz', nullable: true })
  sentAt: Date | null;
}

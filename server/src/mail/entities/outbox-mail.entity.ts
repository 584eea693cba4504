import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

export type OutboxStatus = 'queued' | 'sent' | 'failed';

/** A file rendered when the message goes out (an invoice PDF from its invoice id), never stored as bytes here. */
export interface OutboxAttachmentRef {
  kind: string;
  id: string;
}

/**
 * One outgoing e-mail, queued: the 'mail.send' job carries only this row's id (it is also the job's id), and the row
 * says whether the message went. The body is cleared once it is sent or given up on: sign-in links and customers'
 * details should not outlive the delivery.
 */
@Entity({ name: 'mail_outbox' })
export class OutboxMail {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** Unique per message ('invoice-mail:<log id>', 'booking-confirmation:<booking id>'): queueing twice adds nothing. */
  @Column({ type: 'varchar', length: 200 })
  key: string;

  /** Which feature's outcome handler records the result where that feature keeps it (e.g. the invoice send log). */
  @Column({ type: 'varchar', length: 40 })
  topic: string;

  @Column({ name: 'ref_id', type: 'uuid', nullable: true })
  refId: string | null;

  @Column({ name: 'to_email', type: 'varchar', length: 254 })
  toEmail: string;

  @Column({ name: 'to_name', type: 'varchar', length: 200, nullable: true })
  toName: string | null;

  @Column({ type: 'varchar', length: 300 })
  subject: string;

  @Column({ type: 'text' })
  text: string;

  @Column({ type: 'text', nullable: true })
  html: string | null;

  @Column({ type: 'jsonb', nullable: true })
  attachment: OutboxAttachmentRef | null;

  @Column({ type: 'varchar', length: 16 })
  status: OutboxStatus;

  @Column({ type: 'int' })
  attempts: number;

  @Column({ name: 'last_error', type: 'varchar', length: 500, nullable: true })
  lastError: string | null;

  @Column({ name: 'sent_at', type: 'timestamptz', nullable: true })
  sentAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}

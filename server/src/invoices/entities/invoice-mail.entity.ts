import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

export const INVOICE_MAIL_KINDS = ['invoice', 'reminder', 'receipt', 'statement'] as const;
export type InvoiceMailKind = (typeof INVOICE_MAIL_KINDS)[number];

/** The send log: every invoice, reminder, receipt and statement e-mail tried, and how it went (or that it waits). */
@Entity({ name: 'invoice_mails' })
export class InvoiceMail {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'invoice_id', type: 'uuid', nullable: true })
  invoiceId: string | null;

  @Column({ name: 'payment_id', type: 'uuid', nullable: true })
  paymentId: string | null;

  @Column({ type: 'varchar', length: 16 })
  kind: InvoiceMailKind;

  @Column({ name: 'to_email', type: 'varchar', length: 254 })
  toEmail: string;

  @Column({ type: 'varchar', length: 300 })
  subject: string;

  @Column({ type: 'varchar', length: 16 })
  status: 'queued' | 'sent' | 'failed';

  @Column({ type: 'varchar', length: 500, nullable: true })
  error: string | null;

  @Column({ name: 'sent_by', type: 'uuid', nullable: true })
  sentBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}

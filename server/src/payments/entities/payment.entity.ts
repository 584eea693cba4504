import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** cash, cheque and card-terminal are taken by hand and recorded; online comes from the payment service's webhook. */
export const PAYMENT_METHODS = ['cash', 'cheque', 'card-terminal', 'online'] as const;
export type PaymentMethod = (typeof PAYMENT_METHODS)[number];
export const MANUAL_PAYMENT_METHODS = ['cash', 'cheque', 'card-terminal'] as const;
export type ManualPaymentMethod = (typeof MANUAL_PAYMENT_METHODS)[number];

/** Money received: against a ticket on site, against an invoice, or both (a ticket's on-site part counts on its invoice). */
@Entity({ name: 'payments' })
export class Payment {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'ticket_id', type: 'uuid', nullable: true })
  ticketId: string | null;

  @Column({ name: 'invoice_id', type: 'uuid', nullable: true })
  invoiceId: string | null;

  @Column({ type: 'varchar', length: 16 })
  method: PaymentMethod;

  @Column({ name: 'amount_cents', type: 'integer' })
  amountCents: number;

  /** The cheque number, the terminal's reference, or the payment service's payment id; empty for cash. */
  @Column({ type: 'varchar', length: 60, default: '' })
  reference: string;

  /** The payment service's id for an online payment (unique: a repeated webhook cannot record it twice). */
  @Column({ name: 'external_id', type: 'varchar', length: 120, nullable: true, unique: true })
  externalId: string | null;

  @Column({ name: 'receipt_sent_at', type: 'timestamptz', nullable: true })
  receiptSentAt: Date | null;

  @Column({ name: 'recorded_by', type: 'uuid', nullable: true })
  recordedBy: string | null;

  @CreateDateColumn({ name: 'recorded_at', type: 'timestamptz' })
  recordedAt: Date;
}

import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

export const CHECKOUT_STATUSES = ['open', 'complete', 'expired'] as const;
export type CheckoutStatus = (typeof CHECKOUT_STATUSES)[number];

/** A payment service checkout session opened from an invoice's pay page (its id is the service's session id). */
@Entity({ name: 'invoice_checkouts' })
export class InvoiceCheckout {
  @PrimaryColumn({ type: 'varchar', length: 120 })
  id: string;

  @Column({ name: 'invoice_id', type: 'uuid' })
  invoiceId: string;

  @Column({ name: 'amount_cents', type: 'integer' })
  amountCents: number;

  @Column({ type: 'varchar', length: 3 })
  currency: string;

  @Column({ type: 'varchar', length: 1000 })
  url: string;

  @Column({ type: 'varchar', length: 16, default: 'open' })
  status: CheckoutStatus;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @Column({ name: 'completed_at', type: 'timestamptz', nullable: true })
  completedAt: Date | null;
}

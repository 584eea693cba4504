import { Column, Entity, PrimaryColumn } from 'typeorm';

/** A webhook event already handled: the same event id again is acknowledged and ignored. */
@Entity({ name: 'payment_events' })
export class PaymentEvent {
  @PrimaryColumn({ type: 'varchar', length: 120 })
  id: string;

  @Column({ type: 'varchar', length: 80 })
  type: string;

  /** The event's own creation time at the payment service. */
  @Column({ type: 'timestamptz' })
  created: Date;

  @Column({ name: 'invoice_id', type: 'uuid', nullable: true })
  invoiceId: string | null;

  @Column({ name: 'received_at', type: 'timestamptz', default: () => 'now()' })
  receivedAt: Date;
}

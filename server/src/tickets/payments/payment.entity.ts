import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

export const PAYMENT_METHODS = ['cash', 'cheque', 'card-terminal'] as const;
export type PaymentMethod = (typeof PAYMENT_METHODS)[number];

/** Money taken on site and recorded here; the card itself is run on the sharpener's own terminal. */
@Entity({ name: 'payments' })
export class Payment {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'ticket_id', type: 'uuid', nullable: true })
  ticketId: string | null;

  @Column({ type: 'varchar', length: 16 })
  method: PaymentMethod;

  @Column({ name: 'amount_cents', type: 'integer' })
  amountCents: number;

  /** The cheque number, or the terminal's reference; empty for cash. */
  @Column({ type: 'varchar', length: 60, default: '' })
  reference: string;

  @Column({ name: 'recorded_by', type: 'uuid', nullable: true })
  recordedBy: string | null;

  @CreateDateColumn({ name: 'recorded_at', type: 'timestamptz' })
  recordedAt: Date;
}

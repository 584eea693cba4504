import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

export const REFUND_METHODS = ['none', 'cash', 'cheque', 'card-terminal', 'online'] as const;
export type RefundMethod = (typeof REFUND_METHODS)[number];

/** Takes an amount off an issued invoice (CN-2026-0001): money refunded, or a charge withdrawn. */
@Entity({ name: 'credit_notes' })
export class CreditNote {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar', length: 20, unique: true })
  number: string;

  @Column({ name: 'invoice_id', type: 'uuid' })
  invoiceId: string;

  @Column({ name: 'amount_cents', type: 'integer' })
  amountCents: number;

  @Column({ type: 'varchar', length: 500 })
  reason: string;

  /** How the money went back, when it did; 'none' when the credit only lowers what is owed. */
  @Column({ name: 'refund_method', type: 'varchar', length: 16, default: 'none' })
  refundMethod: RefundMethod;

  @Column({ name: 'created_by', type: 'uuid', nullable: true })
  createdBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}

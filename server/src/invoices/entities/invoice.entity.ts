import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn } from 'typeorm';

/** draft: being put together, no number; sent: issued (numbered); part-paid / paid by what came in; void with a reason. */
export const INVOICE_STATUSES = ['draft', 'sent', 'part-paid', 'paid', 'void'] as const;
export type InvoiceStatus = (typeof INVOICE_STATUSES)[number];

export const BILL_TO = ['customer', 'stop'] as const;
export type BillTo = (typeof BILL_TO)[number];

export interface TaxGroup {
  taxRateBp: number;
  taxableCents: number;
  taxCents: number;
}

/** The bill for one or more finished tickets, to a customer or to the stop where the stop pays. */
@Entity({ name: 'invoices' })
export class Invoice {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** KR-2026-0001, given when the invoice is issued; gapless per year. */
  @Column({ type: 'varchar', length: 20, nullable: true, unique: true })
  number: string | null;

  @Column({ type: 'varchar', length: 16, default: 'draft' })
  status: InvoiceStatus;

  @Column({ name: 'bill_to', type: 'varchar', length: 16 })
  billTo: BillTo;

  @Column({ name: 'customer_id', type: 'uuid', nullable: true })
  customerId: string | null;

  @Column({ name: 'stop_id', type: 'uuid', nullable: true })
  stopId: string | null;

  /** Who the invoice is to, copied at issue so a later rename does not change a sent invoice. */
  @Column({ name: 'bill_to_name', type: 'varchar', length: 120, default: '' })
  billToName: string;

  @Column({ name: 'bill_to_email', type: 'varchar', length: 254, nullable: true })
  billToEmail: string | null;

  @Column({ name: 'bill_to_address', type: 'varchar', length: 500, default: '' })
  billToAddress: string;

  @Column({ type: 'varchar', length: 3, default: 'USD' })
  currency: string;

  @Column({ name: 'issue_date', type: 'date', nullable: true })
  issueDate: string | null;

  @Column({ name: 'due_date', type: 'date', nullable: true })
  dueDate: string | null;

  @Column({ name: 'terms_days', type: 'smallint', default: 14 })
  termsDays: number;

  /** A discount asked for as a share (basis points) ... */
  @Column({ name: 'discount_bp', type: 'integer', default: 0 })
  discountBp: number;

  /** ... or as an amount; the rules package turns either into discountTotalCents. */
  @Column({ name: 'discount_cents', type: 'integer', default: 0 })
  discountCents: number;

  @Column({ name: 'lines_cents', type: 'integer', default: 0 })
  linesCents: number;

  @Column({ name: 'discount_total_cents', type: 'integer', default: 0 })
  discountTotalCents: number;

  @Column({ name: 'subtotal_cents', type: 'integer', default: 0 })
  subtotalCents: number;

  @Column({ name: 'tax_cents', type: 'integer', default: 0 })
  taxCents: number;

  @Column({ name: 'total_cents', type: 'integer', default: 0 })
  totalCents: number;

  @Column({ name: 'tax_groups', type: 'jsonb', default: [] })
  taxGroups: TaxGroup[];

  /** Sum of the payments on the invoice (kept with the status in the same transaction as each payment). */
  @Column({ name: 'paid_cents', type: 'integer', default: 0 })
  paidCents: number;

  /** Sum of its credit notes. */
  @Column({ name: 'credited_cents', type: 'integer', default: 0 })
  creditedCents: number;

  @Column({ type: 'varchar', length: 2000, default: '' })
  notes: string;

  @Column({ name: 'void_reason', type: 'varchar', length: 500, nullable: true })
  voidReason: string | null;

  @Column({ name: 'voided_at', type: 'timestamptz', nullable: true })
  voidedAt: Date | null;

  @Column({ name: 'voided_by', type: 'uuid', nullable: true })
  voidedBy: string | null;

  /** When it was first e-mailed. */
  @Column({ name: 'sent_at', type: 'timestamptz', nullable: true })
  sentAt: Date | null;

  @Column({ name: 'created_by', type: 'uuid', nullable: true })
  createdBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;

  @VersionColumn()
  version: number;
}

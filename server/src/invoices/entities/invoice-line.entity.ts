import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** shear: one ticket line's price; adjustment: a ticket's discount, minimum top-up or trip charge. */
export const INVOICE_LINE_KINDS = ['shear', 'adjustment'] as const;
export type InvoiceLineKind = (typeof INVOICE_LINE_KINDS)[number];

@Entity({ name: 'invoice_lines' })
export class InvoiceLine {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'invoice_id', type: 'uuid' })
  invoiceId: string;

  @Column({ name: 'ticket_id', type: 'uuid', nullable: true })
  ticketId: string | null;

  @Column({ name: 'ticket_line_id', type: 'uuid', nullable: true })
  ticketLineId: string | null;

  @Column({ type: 'smallint' })
  position: number;

  @Column({ type: 'varchar', length: 16 })
  kind: InvoiceLineKind;

  @Column({ type: 'varchar', length: 500 })
  description: string;

  /** May be negative (a ticket's multi-pair discount). */
  @Column({ name: 'amount_cents', type: 'integer' })
  amountCents: number;

  @Column({ type: 'boolean', default: true })
  taxable: boolean;

  @Column({ name: 'tax_rate_bp', type: 'integer', default: 0 })
  taxRateBp: number;
}

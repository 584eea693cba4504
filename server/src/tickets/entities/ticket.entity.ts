import type { EdgeType, ToolKind } from '@keenroute/shared';
import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

export const TICKET_KINDS = ['visit', 'drop-off', 'walk-up'] as const;
export type TicketKind = (typeof TICKET_KINDS)[number];

/** open: shears being worked; finished: every pair done, history written; handed-back: back with the customer. */
export const TICKET_STATUSES = ['open', 'finished', 'handed-back'] as const;
export type TicketStatus = (typeof TICKET_STATUSES)[number];

export const SETTLEMENTS = ['unpaid', 'paid-on-site', 'to-invoice'] as const;
export type Settlement = (typeof SETTLEMENTS)[number];

/** Pairs a booking announced by kind only: "to add" on the ticket until a shear of that kind is added. */
export interface ExpectedPairs {
  toolKind: ToolKind;
  edgeType: EdgeType;
  count: number;
}

/** One customer's shears on one visit or drop-off. Prices are the rules' snapshot, refreshed while the ticket is open. */
@Entity({ name: 'tickets' })
export class Ticket {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'customer_id', type: 'uuid' })
  customerId: string;

  @Column({ name: 'stop_id', type: 'uuid', nullable: true })
  stopId: string | null;

  @Column({ name: 'route_day_id', type: 'uuid', nullable: true })
  routeDayId: string | null;

  @Column({ name: 'booking_id', type: 'uuid', nullable: true })
  bookingId: string | null;

  @Column({ type: 'varchar', length: 16 })
  kind: TicketKind;

  @Column({ type: 'varchar', length: 16, default: 'open' })
  status: TicketStatus;

  /** The route day's date, or the business day the ticket was opened: the stop visit it belongs to. */
  @Column({ name: 'visit_day', type: 'date' })
  visitDay: string;

  @Column({ type: 'varchar', length: 2000, default: '' })
  notes: string;

  @Column({ type: 'jsonb', default: [] })
  expected: ExpectedPairs[];

  @Column({ name: 'charge_trip', type: 'boolean', default: false })
  chargeTrip: boolean;

  @Column({ type: 'varchar', length: 3, default: 'USD' })
  currency: string;

  @Column({ name: 'tax_rate_bp', type: 'integer', default: 0 })
  taxRateBp: number;

  @Column({ name: 'services_taxable', type: 'boolean', default: true })
  servicesTaxable: boolean;

  @Column({ name: 'rate_card_version', type: 'integer', nullable: true })
  rateCardVersion: number | null;

  /** priceTicket's subtotal before any override. */
  @Column({ name: 'rules_subtotal_cents', type: 'integer', default: 0 })
  rulesSubtotalCents: number;

  @Column({ name: 'subtotal_cents', type: 'integer', default: 0 })
  subtotalCents: number;

  @Column({ name: 'tax_cents', type: 'integer', default: 0 })
  taxCents: number;

  @Column({ name: 'total_cents', type: 'integer', default: 0 })
  totalCents: number;

  /** How many shears (lines) the ticket holds; kept with the totals so the reports need not count lines. */
  @Column({ name: 'shear_count', type: 'integer', default: 0 })
  shearCount: number;

  @Column({ name: 'price_summary', type: 'jsonb', default: [] })
  priceSummary: string[];

  @Column({ type: 'varchar', length: 16, default: 'unpaid' })
  settlement: Settlement;

  /** The invoice (not void) that bills this ticket; null until one does. */
  @Column({ name: 'invoice_id', type: 'uuid', nullable: true })
  invoiceId: string | null;

  @Column({ name: 'opened_by', type: 'uuid', nullable: true })
  openedBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;

  @Column({ name: 'finished_at', type: 'timestamptz', nullable: true })
  finishedAt: Date | null;

  @Column({ name: 'handed_back_at', type: 'timestamptz', nullable: true })
  handedBackAt: Date | null;
}

import type { AddOnCode } from '@keenroute/shared';
import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { BenchStatus } from '../bench-status';

/** One shear on a ticket: its add-ons, the rules price, an owner's or office's override, and where it is at the bench. */
@Entity({ name: 'ticket_lines' })
export class TicketLine {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'ticket_id', type: 'uuid' })
  ticketId: string;

  @Column({ name: 'shear_id', type: 'uuid' })
  shearId: string;

  @Column({ name: 'add_ons', type: 'varchar', length: 32, array: true, default: [] })
  addOns: AddOnCode[];

  /** The line's total from priceTicket (before the ticket's discount, minimum and trip charge). */
  @Column({ name: 'price_cents', type: 'integer', default: 0 })
  priceCents: number;

  @Column({ type: 'varchar', length: 500, default: '' })
  explanation: string;

  @Column({ name: 'override_cents', type: 'integer', nullable: true })
  overrideCents: number | null;

  @Column({ name: 'override_reason', type: 'varchar', length: 500, nullable: true })
  overrideReason: string | null;

  @Column({ name: 'bench_status', type: 'varchar', length: 16, default: 'waiting' })
  benchStatus: BenchStatus;

  @Column({ type: 'varchar', length: 2000, default: '' })
  notes: string;

  @Column({ type: 'smallint' })
  position: number;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}

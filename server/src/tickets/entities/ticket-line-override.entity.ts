import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** The audit of one price override: who changed which line, from what to what, and why. */
@Entity({ name: 'ticket_line_overrides' })
export class TicketLineOverride {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'ticket_id', type: 'uuid' })
  ticketId: string;

  @Column({ name: 'ticket_line_id', type: 'uuid', nullable: true })
  ticketLineId: string | null;

  @Column({ name: 'shear_id', type: 'uuid' })
  shearId: string;

  @Column({ name: 'from_cents', type: 'integer' })
  fromCents: number;

  @Column({ name: 'to_cents', type: 'integer' })
  toCents: number;

  @Column({ type: 'varchar', length: 500 })
  reason: string;

  @Column({ name: 'by_user', type: 'uuid', nullable: true })
  byUser: string | null;

  @CreateDateColumn({ name: 'at', type: 'timestamptz' })
  at: Date;
}

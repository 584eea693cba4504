import { Column, CreateDateColumn, Entity, OneToMany, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { BookingItem } from './booking-item.entity';

export const BOOKING_STATUSES = ['booked', 'cancelled', 'checked-in'] as const;
export type BookingStatus = (typeof BOOKING_STATUSES)[number];

/** A drop-off: a customer's shears left at a stop for one of its route days, or mailed in. */
@Entity({ name: 'bookings' })
export class Booking {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'stop_id', type: 'uuid' })
  stopId: string;

  /** Null for a mail-in. */
  @Column({ name: 'route_day_id', type: 'uuid', nullable: true })
  routeDayId: string | null;

  /** The route day's date "YYYY-MM-DD"; null for a mail-in. */
  @Column({ type: 'date', nullable: true })
  day: string | null;

  @Column({ name: 'mail_in', type: 'boolean', default: false })
  mailIn: boolean;

  @Column({ type: 'varchar', length: 16, default: 'booked' })
  status: BookingStatus;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ type: 'varchar', length: 40 })
  phone: string;

  @Column({ type: 'varchar', length: 1000, default: '' })
  notes: string;

  @Column({ type: 'boolean' })
  consent: boolean;

  @Column({ name: 'customer_id', type: 'uuid', nullable: true })
  customerId: string | null;

  /** sha256 of the private manage link's token; the token itself is only ever in the e-mail. */
  @Column({ name: 'manage_token_hash', type: 'char', length: 64 })
  manageTokenHash: string;

  @Column({ name: 'idempotency_key', type: 'uuid' })
  idempotencyKey: string;

  @Column({ name: 'bench_minutes', type: 'integer' })
  benchMinutes: number;

  /** From the rate card in force when booked or last changed; null while no rate card is saved. */
  @Column({ name: 'estimate_cents', type: 'integer', nullable: true })
  estimateCents: number | null;

  /** The ticket the booking was checked in as. */
  @Column({ name: 'ticket_id', type: 'uuid', nullable: true })
  ticketId: string | null;

  @OneToMany(() => BookingItem, (item) => item.booking, { cascade: ['insert'] })
  items: BookingItem[];

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;

  @Column({ name: 'cancelled_at', type: 'timestamptz', nullable: true })
  cancelledAt: Date | null;
}

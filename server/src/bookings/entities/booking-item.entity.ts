import type { EdgeType, ToolKind } from '@keenroute/shared';
import { Column, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { Booking } from './booking.entity';

/** Shears of one kind on a booking; a signed-in client's own shear when `shearId` is set (then count is 1). */
@Entity({ name: 'booking_items' })
export class BookingItem {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'booking_id', type: 'uuid' })
  bookingId: string;

  @ManyToOne(() => Booking, (booking) => booking.items, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'booking_id' })
  booking: Booking;

  /** 0-based order as the customer listed them. */
  @Column({ type: 'smallint' })
  position: number;

  @Column({ name: 'tool_kind', type: 'varchar', length: 16 })
  toolKind: ToolKind;

  @Column({ name: 'edge_type', type: 'varchar', length: 16 })
  edgeType: EdgeType;

  @Column({ type: 'smallint' })
  count: number;

  @Column({ name: 'shear_id', type: 'uuid', nullable: true })
  shearId: string | null;
}

import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

/** A sharpener's secret iCalendar feed address; renewing it replaces the token and the old address stops working. */
@Entity({ name: 'calendar_feeds' })
export class CalendarFeed {
  @PrimaryColumn({ name: 'user_id', type: 'uuid' })
  userId: string;

  @Column({ type: 'varchar', length: 64, unique: true })
  token: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}

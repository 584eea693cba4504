import type { Weekday } from '@keenroute/shared';
import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';

/** numeric columns come back from node-postgres as text. */
const decimal = { to: (value: number) => value, from: (value: string | number) => Number(value) };

/** The business's one row of planning settings: the base the route days start and end at, hours, travel model. */
@Entity({ name: 'planning_settings' })
export class PlanningSettings {
  @PrimaryColumn({ type: 'smallint', default: 1 })
  id: number;

  @Column({ name: 'base_label', type: 'varchar', length: 200 })
  baseLabel: string;

  @Column({ name: 'base_latitude', type: 'double precision' })
  baseLatitude: number;

  @Column({ name: 'base_longitude', type: 'double precision' })
  baseLongitude: number;

  @Column({ name: 'work_weekdays', type: 'varchar', length: 3, array: true })
  workWeekdays: Weekday[];

  /** Minutes after midnight. */
  @Column({ name: 'shift_start', type: 'smallint' })
  shiftStart: number;

  @Column({ name: 'latest_finish', type: 'smallint' })
  latestFinish: number;

  @Column({ name: 'lunch_earliest', type: 'smallint' })
  lunchEarliest: number;

  @Column({ name: 'lunch_latest', type: 'smallint' })
  lunchLatest: number;

  /** 0 means no break is planned. */
  @Column({ name: 'lunch_minutes', type: 'smallint' })
  lunchMinutes: number;

  /** Road distance over great-circle distance. */
  @Column({ type: 'numeric', precision: 3, scale: 2, transformer: decimal })
  circuity: number;

  @Column({ name: 'average_speed_kmh', type: 'smallint' })
  averageSpeedKmh: number;

  /** Visit notices go out this many days before the route day. */
  @Column({ name: 'notice_days', type: 'smallint' })
  noticeDays: number;

  @Column({ name: 'solve_seconds', type: 'smallint' })
  solveSeconds: number;

  /** Bookings for a route day close this many days before it, at `bookingCutoffHour` (business time zone). */
  @Column({ name: 'booking_cutoff_days_before', type: 'smallint', default: 1 })
  bookingCutoffDaysBefore: number;

  @Column({ name: 'booking_cutoff_hour', type: 'smallint', default: 18 })
  bookingCutoffHour: number;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}

import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn } from 'typeorm';

/**
 * One sharpener's day on the road. The start place and hours are copied from the planning settings when the day is
 * made, so later changes to the settings do not move a day already planned. Times are minutes after midnight.
 */
@Entity({ name: 'route_days' })
export class RouteDay {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'sharpener_id', type: 'uuid' })
  sharpenerId: string;

  /** "YYYY-MM-DD". */
  @Column({ type: 'date' })
  day: string;

  @Column({ name: 'start_label', type: 'varchar', length: 200 })
  startLabel: string;

  @Column({ name: 'start_latitude', type: 'double precision' })
  startLatitude: number;

  @Column({ name: 'start_longitude', type: 'double precision' })
  startLongitude: number;

  @Column({ name: 'shift_start', type: 'smallint' })
  shiftStart: number;

  @Column({ name: 'latest_finish', type: 'smallint' })
  latestFinish: number;

  @Column({ name: 'lunch_earliest', type: 'smallint' })
  lunchEarliest: number;

  @Column({ name: 'lunch_latest', type: 'smallint' })
  lunchLatest: number;

  @Column({ name: 'lunch_minutes', type: 'smallint' })
  lunchMinutes: number;

  @Column({ name: 'lunch_start', type: 'smallint', nullable: true })
  lunchStart: number | null;

  /** How many stops come before the break. */
  @Column({ name: 'lunch_after', type: 'smallint', nullable: true })
  lunchAfter: number | null;

  /** Leaves the start place; null while the day has no stops. */
  @Column({ type: 'smallint', nullable: true })
  departure: number | null;

  /** Back at the start place. */
  @Column({ type: 'smallint', nullable: true })
  finish: number | null;

  @Column({ name: 'distance_km', type: 'double precision', default: 0 })
  distanceKm: number;

  @Column({ name: 'drive_minutes', type: 'integer', default: 0 })
  driveMinutes: number;

  @Column({ name: 'bench_minutes', type: 'integer', default: 0 })
  benchMinutes: number;

  /** Bumped on every change, so two planners editing the same day do not overwrite each other unseen. */
  @VersionColumn({ type: 'integer' })
  version: number;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}

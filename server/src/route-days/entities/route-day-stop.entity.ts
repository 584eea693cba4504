import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** Why a stop's planned time breaks a rule after a hand move; null when the schedule keeps every rule. */
export const SCHEDULE_PROBLEMS = ['after-closing', 'closed-that-day', 'day-too-long'] as const;
export type ScheduleProblem = (typeof SCHEDULE_PROBLEMS)[number];

/** A stop on a route day, in order, with its planned times (minutes after midnight). */
@Entity({ name: 'route_day_stops' })
export class RouteDayStop {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'route_day_id', type: 'uuid' })
  routeDayId: string;

  @Column({ name: 'stop_id', type: 'uuid' })
  stopId: string;

  /** 0-based order in the day. */
  @Column({ type: 'smallint' })
  position: number;

  @Column({ type: 'smallint' })
  arrival: number;

  /** Bench work starts: the arrival, or the opening when early. */
  @Column({ type: 'smallint' })
  start: number;

  @Column({ type: 'smallint' })
  leave: number;

  @Column({ name: 'bench_minutes', type: 'smallint' })
  benchMinutes: number;

  @Column({ name: 'drive_minutes_before', type: 'integer', default: 0 })
  driveMinutesBefore: number;

  @Column({ name: 'km_before', type: 'double precision', default: 0 })
  kmBefore: number;

  @Column({ type: 'varchar', length: 32, nullable: true })
  problem: ScheduleProblem | null;

  /** Kept on this day when the week is planned again. */
  @Column({ type: 'boolean', default: false })
  locked: boolean;

  /** Kept at this position too. */
  @Column({ name: 'position_locked', type: 'boolean', default: false })
  positionLocked: boolean;
}

import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';

export interface UnplannedStop {
  stopId: string;
  reason: string;
}

/** The last "plan the week" run for a week: what could not be planned, and why. */
@Entity({ name: 'route_week_plans' })
export class RouteWeekPlan {
  /** The Monday, "YYYY-MM-DD". */
  @PrimaryColumn({ name: 'week_start', type: 'date' })
  weekStart: string;

  @Column({ type: 'jsonb', default: [] })
  unplanned: UnplannedStop[];

  @Column({ name: 'planned_by', type: 'uuid', nullable: true })
  plannedBy: string | null;

  @UpdateDateColumn({ name: 'planned_at', type: 'timestamptz' })
  plannedAt: Date;

  @Column({ name: 'solve_ms', type: 'integer', default: 0 })
  solveMs: number;
}

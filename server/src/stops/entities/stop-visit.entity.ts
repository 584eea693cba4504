import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A worked visit to a stop; last visit and next due are derived from these rows. */
@Entity({ name: 'stop_visits' })
export class StopVisit {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'stop_id', type: 'uuid' })
  stopId: string;

  /** The calendar date the visit was worked, "YYYY-MM-DD". */
  @Column({ name: 'worked_on', type: 'date' })
  workedOn: string;

  @Column({ name: 'sharpener_id', type: 'uuid', nullable: true })
  sharpenerId: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}

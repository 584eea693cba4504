import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** One stretch of a customer working at one stop; the open row (no end) is where they are now. */
@Entity({ name: 'customer_stop_history' })
export class CustomerStopHistory {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'customer_id', type: 'uuid' })
  customerId: string;

  @Column({ name: 'stop_id', type: 'uuid' })
  stopId: string;

  @Column({ name: 'started_at', type: 'timestamptz' })
  startedAt: Date;

  @Column({ name: 'ended_at', type: 'timestamptz', nullable: true })
  endedAt: Date | null;
}

import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

export const VISIT_NOTICE_STATUSES = ['pending', 'sent', 'failed'] as const;
export type VisitNoticeStatus = (typeof VISIT_NOTICE_STATUSES)[number];

/** One visit notice e-mail: unique per stop, day and recipient, so it is sent exactly once. */
@Entity({ name: 'visit_notices' })
export class VisitNotice {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'stop_id', type: 'uuid' })
  stopId: string;

  @Column({ type: 'date' })
  day: string;

  @Column({ type: 'varchar', length: 254 })
  recipient: string;

  @Column({ name: 'customer_id', type: 'uuid', nullable: true })
  customerId: string | null;

  @Column({ type: 'varchar', length: 16, default: 'pending' })
  status: VisitNoticeStatus;

  @Column({ type: 'smallint', default: 0 })
  attempts: number;

  @Column({ name: 'last_error', type: 'varchar', length: 500, nullable: true })
  lastError: string | null;

  @Column({ name: 'sent_at', type: 'timestamptz', nullable: true })
  sentAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}

import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

export const SHEAR_HISTORY_KINDS = ['registered', 'serviced', 'status', 'moved', 'note'] as const;
export type ShearHistoryKind = (typeof SHEAR_HISTORY_KINDS)[number];

/** One line of a shear's service history; tickets add the "serviced" lines. */
@Entity({ name: 'shear_history' })
export class ShearHistoryEntry {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'shear_id', type: 'uuid' })
  shearId: string;

  @Column({ name: 'happened_on', type: 'date' })
  happenedOn: string;

  @Column({ type: 'varchar', length: 16 })
  kind: ShearHistoryKind;

  @Column({ type: 'varchar', length: 500 })
  summary: string;

  @Column({ name: 'ticket_id', type: 'uuid', nullable: true })
  ticketId: string | null;

  @Column({ name: 'recorded_by', type: 'uuid', nullable: true })
  recordedBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}

import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

@Entity({ name: 'customers' })
export class Customer {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  /** Unique when set (case-insensitive, by the migration's index): the import's duplicate rule. */
  @Column({ type: 'varchar', length: 254, nullable: true })
  email: string | null;

  @Column({ type: 'varchar', length: 40, nullable: true })
  phone: string | null;

  /** Where they work now; null for a mail-in customer. Earlier stops are in customer_stop_history. */
  @Column({ name: 'stop_id', type: 'uuid', nullable: true })
  stopId: string | null;

  /** Their client account, when they have one. */
  @Column({ name: 'user_id', type: 'uuid', nullable: true })
  userId: string | null;

  @Column({ type: 'varchar', length: 2000, default: '' })
  notes: string;

  @Column({ name: 'visit_notice_consent', type: 'boolean', default: false })
  visitNoticeConsent: boolean;

  @Column({ type: 'boolean', default: true })
  active: boolean;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}

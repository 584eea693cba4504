import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** What the audit log records, in the trade's words; the migration's CHECK holds the same list. */
export const AUDIT_ACTIONS = [
  'sign-in',
  'sign-in-failed',
  'user-invited',
  'role-changed',
  'user-deactivated',
  'user-reactivated',
  'price-override',
  'invoice-voided',
  'credit-note-issued',
  'payment-recorded',
] as const;
export type AuditAction = (typeof AUDIT_ACTIONS)[number];

export const AUDIT_SUBJECTS = ['user', 'ticket', 'invoice'] as const;
export type AuditSubject = (typeof AUDIT_SUBJECTS)[number];

/** Small and flat: ids, from → to values, amounts in cents. Never a password, token or card detail. */
export type AuditDetail = Record<string, string | number | boolean | null>;

/** One line of the audit log. Append-only: the table refuses UPDATE and DELETE. */
@Entity({ name: 'audit_entries' })
export class AuditEntry {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @CreateDateColumn({ type: 'timestamptz' })
  at: Date;

  /** Null for the payment service's webhook and for failed sign-ins. */
  @Column({ name: 'actor_id', type: 'uuid', nullable: true })
  actorId: string | null;

  /** The e-mail as it was then (or as typed, for a failed sign-in), so the entry reads the same after a change. */
  @Column({ name: 'actor_email', type: 'varchar', length: 254, nullable: true })
  actorEmail: string | null;

  @Column({ type: 'varchar', length: 32 })
  action: AuditAction;

  @Column({ name: 'subject_type', type: 'varchar', length: 16 })
  subjectType: AuditSubject;

  @Column({ name: 'subject_id', type: 'uuid', nullable: true })
  subjectId: string | null;

  @Column({ type: 'jsonb', default: {} })
  detail: AuditDetail;

  @Column({ type: 'inet', nullable: true })
  ip: string | null;
}

// The audit log API's shapes (server/src/audit): GET /api/audit, owner only.

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

export type AuditSubject = 'user' | 'ticket' | 'invoice';

/** Flat values only: ids, from → to, amounts in cents, reasons. */
export type AuditDetail = Record<string, string | number | boolean | null>;

export interface AuditEntry {
  id: string;
  at: string;
  /** Null for the payment service's webhook and for failed sign-ins. */
  actorId: string | null;
  actorEmail: string | null;
  action: AuditAction;
  subjectType: AuditSubject;
  subjectId: string | null;
  detail: AuditDetail;
  ip: string | null;
}

export interface AuditPage {
  items: AuditEntry[];
  total: number;
  page: number;
  pageSize: number;
}

export interface AuditListParams {
  page?: number;
  pageSize?: number;
  action?: AuditAction;
  actorId?: string;
  actor?: string;
  subjectId?: string;
  from?: string;
  to?: string;
}

import type { AuditEntry } from '../types';

/** An entry as GET /api/audit returns it; invented demo people and numbers. */
export function auditEntry(overrides: Partial<AuditEntry> = {}): AuditEntry {
  return {
    id: 'entry-1',
    at: '2026-03-16T15:04:00.000Z',
    actorId: 'u-office',
    actorEmail: 'office@demo.keenroute.test',
    action: 'price-override',
    subjectType: 'ticket',
    subjectId: 'ticket-7',
    detail: { lineId: 'line-1', shearId: 'shear-1', fromCents: 4200, toCents: 2750, reason: 'Loyal shop' },
    ip: '203.0.113.9',
    ...overrides,
  };
}

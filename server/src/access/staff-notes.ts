import type { Actor } from '../auth/actor';

/**
 * Notes on customers and shears are the staff's working remarks ("pays late", "nicked tip, warned her"); a client
 * reading their own record sees everything but them.
 */
export function withoutStaffNotes<T extends { notes: string }>(actor: Actor, record: T): T {
  return actor.role === 'client' ? { ...record, notes: '' } : record;
}

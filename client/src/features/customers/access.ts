import type { Role } from '@keenroute/shared';

/** Owner and office add and edit customers (the API refuses anyone else); the others only read. */
export function canManageCustomers(role: Role): boolean {
  return role === 'owner' || role === 'office';
}

/** Stop pages are for staff; a client sees a stop's name without a link. */
export function canOpenStops(role: Role): boolean {
  return role !== 'client';
}

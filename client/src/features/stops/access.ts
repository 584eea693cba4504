import type { Role } from '@keenroute/shared';

/** Owner and office add and change stops and record visits (the API refuses anyone else). */
export function canManageStops(role: Role): boolean {
  return role === 'owner' || role === 'office';
}

/** The sharpener on the road keeps the access notes of their own stops up to date, as the office does. */
export function canEditAccessNotes(role: Role): boolean {
  return role === 'owner' || role === 'office' || role === 'sharpener';
}

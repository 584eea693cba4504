import type { Role } from '@keenroute/shared';

/** Only an owner changes the rates (the API refuses anyone else). */
export function canEditRates(role: Role): boolean {
  return role === 'owner';
}

/** The saved versions are the owner's and the office's to read. */
export function canSeeRateHistory(role: Role): boolean {
  return role === 'owner' || role === 'office';
}

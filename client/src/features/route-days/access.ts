import type { Role } from '@keenroute/shared';

/** Owner and office plan anyone's week; a sharpener sees and re-orders their own days. */
export function canPlanWeek(role: Role): boolean {
  return role === 'owner' || role === 'office';
}

/** Only the owner changes the planning settings; the office reads them. */
export function canEditPlanningSettings(role: Role): boolean {
  return role === 'owner';
}

export function canReadPlanningSettings(role: Role): boolean {
  return role === 'owner' || role === 'office';
}

/** The calendar feed is the caller's own days: those who work route days, sharpener and owner. */
export function hasCalendarFeed(role: Role): boolean {
  return role === 'owner' || role === 'sharpener';
}

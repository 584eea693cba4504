import type { Role } from '@keenroute/shared';

/** Only owner and office change a line's price, with a reason (as the API allows); the server keeps the audit row. */
export function canOverridePrice(role: Role): boolean {
  return role === 'owner' || role === 'office';
}

/** Registering a shear or a customer at the stop; the server decides, this only shapes the screen. */
export function canRegisterAtStop(role: Role): boolean {
  return role === 'owner' || role === 'office' || role === 'sharpener';
}

import type { Role } from '@keenroute/shared';

/** Owner and office register and edit shears, change their status and print labels (as the API allows). */
export function canManageShears(role: Role): boolean {
  return role === 'owner' || role === 'office';
}

/** A sharpener adds photos at the bench, as owner and office do. */
export function canUploadShearPhotos(role: Role): boolean {
  return role === 'owner' || role === 'office' || role === 'sharpener';
}

export function canDeleteShearPhotos(role: Role): boolean {
  return canManageShears(role);
}

/** The bench plan is for the people who sharpen and run the business, not the shear's owner. */
export function canSeeEdgeRecipe(role: Role): boolean {
  return role !== 'client';
}

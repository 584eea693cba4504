/** Who a signed-in person is in the business; every API route names the roles it admits. */
export const ROLES = ['owner', 'office', 'sharpener', 'client'] as const;
export type Role = (typeof ROLES)[number];

/** Staff roles run the business; a client sees only what is theirs. */
export const STAFF_ROLES: readonly Role[] = ['owner', 'office', 'sharpener'];

/** Roles that may invite users and change them: owner and office. Only an owner may make another owner. */
export const USER_ADMIN_ROLES: readonly Role[] = ['owner', 'office'];

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}

export function canAssignRole(actor: Role, target: Role): boolean {
  if (actor === 'owner') return true;
  return actor === 'office' && target !== 'owner';
}

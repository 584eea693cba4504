import { canAssignRole } from '@keenroute/shared';
import type { SessionUser } from '@/lib/session';
import type { TeamMember } from './types';

/** Nobody changes their own account here, and only an owner touches another owner (the shared rule). */
export function canManageMember(actor: SessionUser, member: TeamMember): boolean {
  return actor.id !== member.id && canAssignRole(actor.role, member.role);
}

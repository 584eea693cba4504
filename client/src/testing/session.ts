import type { Role } from '@keenroute/shared';
import { session, type SessionUser } from '@/lib/session';

export const PEOPLE: Record<Role, SessionUser> = {
  owner: { id: 'u-owner', email: 'owner@demo.keenroute.test', name: 'Rowan Owner', role: 'owner' },
  office: { id: 'u-office', email: 'office@demo.keenroute.test', name: 'Oakley Office', role: 'office' },
  sharpener: { id: 'u-sharpener', email: 'sharpener@demo.keenroute.test', name: 'Sasha Hone', role: 'sharpener' },
  client: { id: 'u-client', email: 'client@demo.keenroute.test', name: 'Casey Groomer', role: 'client' },
};

export function signInAs(role: Role, accessToken = `token-${role}`): SessionUser {
  const user = PEOPLE[role];
  session.start({ accessToken, user });
  return user;
}

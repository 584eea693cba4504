import type { Role } from '@keenroute/shared';

/** Who is calling: what services receive as their first argument. */
export interface Actor {
  id: string;
  email: string;
  name: string;
  role: Role;
}

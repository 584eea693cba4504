import type { Role } from '@keenroute/shared';

export type MemberStatus = 'invited' | 'active' | 'deactivated';

/** A person who signs in to Keenroute, as the Team page lists them. */
export interface TeamMember {
  id: string;
  email: string;
  name: string;
  role: Role;
  status: MemberStatus;
  createdAt: string;
  lastSignInAt: string | null;
}

export interface Page<T> {
  items: T[];
  total: number;
}

export const TEAM_SORTS = ['name', 'email', 'role', 'createdAt'] as const;
export type TeamSort = (typeof TEAM_SORTS)[number];
export type SortOrder = 'asc' | 'desc';

export const PAGE_SIZES = [10, 25, 50] as const;

export interface TeamListParams {
  page: number;
  pageSize: number;
  q: string;
  sort: TeamSort;
  order: SortOrder;
}

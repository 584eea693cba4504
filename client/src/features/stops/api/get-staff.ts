import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Role } from '@keenroute/shared';
import { api } from '@/lib/api-client';
import type { Page } from '../types';

/** The few fields of a user the stop screens need to pick a sharpener. */
export interface StaffMember {
  id: string;
  name: string;
  role: Role;
  status: 'invited' | 'active' | 'deactivated';
}

// Under the users key, so a change on the Team page refreshes the pickers too.
export const staffQueryKey = ['users', 'stop-sharpeners'] as const;

/** Who can work a stop: sharpeners and owners (an owner is often a sharpener too), not deactivated. */
export function sharpenersOf(users: StaffMember[]): StaffMember[] {
  return users.filter((user) => (user.role === 'sharpener' || user.role === 'owner') && user.status !== 'deactivated');
}

export async function getStaff(signal?: AbortSignal): Promise<StaffMember[]> {
  const page = await api.get<Page<StaffMember>>('/users', {
    query: { pageSize: 100, sort: 'name', roles: 'sharpener,owner' },
    signal,
  });
  return sharpenersOf(page.items);
}

export function getStaffQueryOptions() {
  return queryOptions({ queryKey: staffQueryKey, queryFn: ({ signal }) => getStaff(signal), staleTime: 5 * 60_000 });
}

/** GET /api/users is for owner and office only: pass enabled false for anyone else. */
export function useStaff({ enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...getStaffQueryOptions(), enabled });
}

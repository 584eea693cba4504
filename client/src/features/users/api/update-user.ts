import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Role } from '@keenroute/shared';
import { api } from '@/lib/api-client';
import type { TeamMember } from '../types';
import { usersQueryKey } from './get-users';

export interface MemberChanges {
  name?: string;
  role?: Role;
  active?: boolean;
}

export function updateUser({ id, changes }: { id: string; changes: MemberChanges }): Promise<TeamMember> {
  return api.patch<TeamMember>(`/users/${encodeURIComponent(id)}`, changes);
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueryKey }),
  });
}

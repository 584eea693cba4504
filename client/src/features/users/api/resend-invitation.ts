import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { usersQueryKey } from './get-users';

export function resendInvitation(id: string): Promise<void> {
  return api.post<void>(`/users/${encodeURIComponent(id)}/invitations`);
}

export function useResendInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resendInvitation,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueryKey }),
  });
}

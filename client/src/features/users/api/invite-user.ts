import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Role } from '@keenroute/shared';
import { api } from '@/lib/api-client';
import { isFieldError } from '@/lib/form-errors';
import type { TeamMember } from '../types';
import { usersQueryKey } from './get-users';

export interface InvitationInput {
  email: string;
  name: string;
  role: Role;
}

export function inviteUser(input: InvitationInput): Promise<TeamMember> {
  return api.post<TeamMember>('/users/invitations', input);
}

export function useInviteUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: inviteUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueryKey }),
    // The form puts these on its fields: bad input, and an e-mail that is already a user.
    meta: { handlesError: (error) => isFieldError(error) || error.status === 409 },
  });
}

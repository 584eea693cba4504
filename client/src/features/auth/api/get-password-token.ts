import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export interface PasswordToken {
  purpose: 'invite' | 'reset';
  email: string;
  name: string;
}

export function getPasswordToken(token: string): Promise<PasswordToken> {
  return api.get<PasswordToken>(`/auth/tokens/${encodeURIComponent(token)}`, { auth: false });
}

export function getPasswordTokenQueryOptions(token: string) {
  return queryOptions({
    queryKey: ['auth', 'password-token', token],
    queryFn: () => getPasswordToken(token),
    // A link is single-use: never answer from a cached look-up.
    staleTime: 0,
    gcTime: 0,
    retry: false,
    meta: { handlesError: (error) => error.status === 404 },
  });
}

export function usePasswordToken(token: string) {
  return useQuery({ ...getPasswordTokenQueryOptions(token), enabled: token.length > 0 });
}

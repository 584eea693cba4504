import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { session } from '@/lib/session';

export function logout(): Promise<void> {
  return api.post<void>('/auth/logout', undefined, { retryOn401: false });
}

export function useLogout() {
  return useMutation({
    mutationFn: logout,
    // Signed out here whatever the server says; the provider then drops this person's cached data.
    onSettled: () => session.end('signed-out'),
    meta: { handlesError: () => true },
  });
}

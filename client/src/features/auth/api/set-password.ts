import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { isFieldError } from '@/lib/form-errors';
import { session, type AuthResponse } from '@/lib/session';

export interface SetPasswordInput {
  token: string;
  password: string;
}

export function setPassword(input: SetPasswordInput): Promise<AuthResponse> {
  return api.post<AuthResponse>('/auth/password', input, { auth: false });
}

export function useSetPassword() {
  return useMutation({
    mutationFn: setPassword,
    onSuccess: (auth) => session.start(auth),
    meta: { handlesError: (error) => error.status === 404 || isFieldError(error) },
  });
}

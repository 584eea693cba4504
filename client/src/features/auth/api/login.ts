import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { isFieldError } from '@/lib/form-errors';
import { session, type AuthResponse } from '@/lib/session';

export interface LoginInput {
  email: string;
  password: string;
}

export function login(input: LoginInput): Promise<AuthResponse> {
  return api.post<AuthResponse>('/auth/login', input, { auth: false });
}

export function useLogin() {
  return useMutation({
    mutationFn: login,
    onSuccess: (auth) => session.start(auth),
    // The form shows wrong credentials and field errors itself.
    meta: { handlesError: (error) => error.status === 401 || isFieldError(error) },
  });
}

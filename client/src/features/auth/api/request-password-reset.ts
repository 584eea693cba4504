import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { isFieldError } from '@/lib/form-errors';

export interface PasswordResetRequest {
  email: string;
}

export function requestPasswordReset(input: PasswordResetRequest): Promise<{ message: string }> {
  return api.post<{ message: string }>('/auth/password-reset', input, { auth: false });
}

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: requestPasswordReset,
    meta: { handlesError: isFieldError },
  });
}

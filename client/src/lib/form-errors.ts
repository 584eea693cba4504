import { ApiError } from './api-error';

interface FormWithErrors {
  setErrors: (errors: Record<string, string>) => void;
}

/** Puts a 400's field messages on the form's fields; answers whether there were any. */
export function showFieldErrors(form: FormWithErrors, error: unknown): boolean {
  if (!(error instanceof ApiError) || !error.hasFieldErrors) return false;
  const errors: Record<string, string> = {};
  for (const [field, messages] of Object.entries(error.fields)) errors[field] = messages.join(' ');
  form.setErrors(errors);
  return true;
}

export function isFieldError(error: ApiError): boolean {
  return error.status === 400 && error.hasFieldErrors;
}

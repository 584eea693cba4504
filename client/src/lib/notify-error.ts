import { notifications } from '@mantine/notifications';
import { ApiError } from './api-error';
import type { AppMeta } from './query-client';

function titleFor(error: ApiError): string {
  if (error.status === 0) return 'No connection';
  if (error.status === 403) return 'Not allowed';
  if (error.status === 404) return 'Not found';
  if (error.status === 409) return 'Already there';
  if (error.status === 429) return 'Slow down';
  if (error.status >= 500) return 'Server problem';
  return 'That did not work';
}

/** The one place API errors turn into notifications with the server's message. */
export function notifyError(error: unknown, meta?: AppMeta): void {
  const apiError = error instanceof ApiError ? error : null;
  // A 401 has already sent the person to sign in, which says why.
  if (apiError?.status === 401) return;
  if (apiError && meta?.handlesError?.(apiError)) return;
  const reference = apiError?.requestId && apiError.status >= 500 ? ` (reference ${apiError.requestId})` : '';
  notifications.show({
    color: 'red',
    title: apiError ? titleFor(apiError) : 'Something went wrong',
    message: `${apiError?.message ?? 'An unexpected error happened. Reload the page and try again.'}${reference}`,
  });
}

import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-error';
import { notifyError } from './notify-error';

export interface AppMeta extends Record<string, unknown> {
  /** Errors the screen shows itself (a form's field errors, an expired link); the global notice skips them. */
  handlesError?: (error: ApiError) => boolean;
}

declare module '@tanstack/react-query' {
  interface Register {
    queryMeta: AppMeta;
    mutationMeta: AppMeta;
  }
}

// Client errors (4xx) will not change on a second try; network blips and 5xx may.
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

export function createQueryClient(options: { retry?: boolean } = {}): QueryClient {
  return new QueryClient({
    queryCache: new QueryCache({ onError: (error, query) => notifyError(error, query.meta) }),
    mutationCache: new MutationCache({
      onError: (error, _variables, _result, mutation) => notifyError(error, mutation.meta),
    }),
    defaultOptions: {
      queries: {
        retry: options.retry === false ? false : shouldRetry,
        staleTime: 30_000,
        refetchOnWindowFocus: false,
      },
      mutations: { retry: false },
    },
  });
}

import { ApiError } from './api-error';
import { session, type AuthResponse } from './session';

const API_BASE = '/api';

type Query = Record<string, string | number | boolean | undefined | null>;

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  body?: unknown;
  query?: Query;
  signal?: AbortSignal;
  /** Send the access token (default true). */
  auth?: boolean;
  /** On a 401, refresh the session once and retry (default: same as auth). */
  retryOn401?: boolean;
  /** Read the answer as a Blob (images, PDFs) instead of JSON. */
  responseType?: 'json' | 'blob';
}

type RefreshOutcome = 'ok' | 'refused' | 'unreachable';

let refreshInFlight: Promise<RefreshOutcome> | null = null;

/** Trades the refresh cookie for a new access token; concurrent callers share one request. */
export function refreshSession(): Promise<RefreshOutcome> {
  refreshInFlight ??= (async (): Promise<RefreshOutcome> => {
    try {
      const response = await fetch(`${API_BASE}/auth/refresh`, {
        method: 'POST',
        credentials: 'same-origin',
        headers: { Accept: 'application/json' },
      });
      if (!response.ok) return 'refused';
      session.start((await response.json()) as AuthResponse);
      return 'ok';
    } catch {
      return 'unreachable';
    } finally {
      refreshInFlight = null;
    }
  })();
  return refreshInFlight;
}

/** On app load: a valid refresh cookie signs the person back in, so a reload keeps them signed in. */
export async function restoreSession(): Promise<void> {
  const outcome = await refreshSession();
  if (outcome !== 'ok' && session.getState().status === 'restoring') session.end('never-signed-in');
}

function buildUrl(path: string, query?: Query): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value));
  }
  const search = params.toString();
  return `${API_BASE}${path}${search ? `?${search}` : ''}`;
}

async function send(path: string, options: RequestOptions, token: string | null): Promise<Response> {
  // A FormData body is multipart: the browser sets its Content-Type with the boundary.
  const multipart = options.body instanceof FormData;
  const headers: Record<string, string> = { Accept: options.responseType === 'blob' ? '*/*' : 'application/json' };
  if (options.body !== undefined && !multipart) headers['Content-Type'] = 'application/json';
  if (token) headers.Authorization = `Bearer ${token}`;
  try {
    return await fetch(buildUrl(path, options.query), {
      method: options.method ?? 'GET',
      headers,
      body:
        options.body === undefined ? undefined : multipart ? (options.body as FormData) : JSON.stringify(options.body),
      credentials: 'same-origin',
      signal: options.signal,
    });
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw ApiError.unreachable();
  }
}

// If another request already refreshed while this one was in flight, reuse its token instead of refreshing again.
async function tokenAfterRefresh(usedToken: string | null): Promise<string | null> {
  const current = session.getAccessToken();
  if (current && current !== usedToken) return current;
  const outcome = await refreshSession();
  if (outcome === 'unreachable') throw ApiError.unreachable();
  return outcome === 'ok' ? session.getAccessToken() : null;
}

async function readBody<T>(response: Response): Promise<T> {
  const text = await response.text();
  return (text ? JSON.parse(text) : undefined) as T;
}

export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const auth = options.auth ?? true;
  const token = auth ? session.getAccessToken() : null;
  let response = await send(path, options, token);

  if (response.status === 401 && (options.retryOn401 ?? auth)) {
    const freshToken = await tokenAfterRefresh(token);
    if (freshToken) response = await send(path, options, freshToken);
    if (!freshToken || response.status === 401) {
      session.end('expired');
      throw new ApiError(401);
    }
  }

  if (!response.ok) throw await ApiError.fromResponse(response);
  if (options.responseType === 'blob') return (await response.blob()) as T;
  return readBody<T>(response);
}

export const api = {
  get: <T>(path: string, options?: Omit<RequestOptions, 'method' | 'body'>) => apiRequest<T>(path, options),
  post: <T>(path: string, body?: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'POST', body }),
  patch: <T>(path: string, body?: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'PATCH', body }),
  put: <T>(path: string, body?: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'PUT', body }),
  delete: <T = void>(path: string, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'DELETE' }),
  /** An image or a PDF, fetched with the auth header (an <img src> or a link cannot send it). */
  blob: (path: string, options?: Omit<RequestOptions, 'method' | 'body' | 'responseType'>) =>
    apiRequest<Blob>(path, { ...options, responseType: 'blob' }),
  /** A multipart form (file uploads); the server's refusal comes back as an ApiError like any other. */
  upload: <T>(path: string, form: FormData, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'POST', body: form }),
};

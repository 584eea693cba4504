import { ApiError } from '@/lib/api-error';
import { session } from '@/lib/session';
import type { PublicDay } from '../types';

type Query = Record<string, string | undefined>;

export interface PublicRequestOptions {
  method?: 'GET' | 'POST' | 'PATCH';
  body?: unknown;
  query?: Query;
  signal?: AbortSignal;
  /** Send a signed-in client's token so the server can link the booking to their account. */
  withSession?: boolean;
}

/** A refused booking call; a full day's 409 also carries the next day that fits, when the server found one. */
export class PublicApiError extends ApiError {
  readonly nextDay: PublicDay | null;
  readonly nextRouteDayId: string | null;

  constructor(status: number, body: Record<string, unknown> = {}) {
    super(status, body);
    this.nextDay = isPublicDay(body.nextDay) ? body.nextDay : null;
    const fromFields = this.fields.nextRouteDayId?.[0];
    this.nextRouteDayId = this.nextDay?.routeDayId ?? fromFields ?? null;
  }
}

function isPublicDay(value: unknown): value is PublicDay {
  if (typeof value !== 'object' || value === null) return false;
  const day = value as Partial<PublicDay>;
  return typeof day.routeDayId === 'string' && typeof day.day === 'string' && typeof day.arrivalWindow === 'object';
}

function urlFor(path: string, query?: Query): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) if (value) params.set(key, value);
  const search = params.toString();
  return `/api${path}${search ? `?${search}` : ''}`;
}

// The public routes need no sign-in, so a 401 here is never a reason to refresh or send anyone to sign in.
export async function publicRequest<T>(path: string, options: PublicRequestOptions = {}): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';
  const token = options.withSession ? session.getAccessToken() : null;
  if (token) headers.Authorization = `Bearer ${token}`;
  let response: Response;
  try {
    response = await fetch(urlFor(path, options.query), {
      method: options.method ?? 'GET',
      headers,
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      credentials: 'same-origin',
      signal: options.signal,
    });
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw new PublicApiError(0, { error: 'Network Error' });
  }
  const text = await response.text();
  let body: unknown;
  try {
    body = text ? JSON.parse(text) : undefined;
  } catch {
    body = undefined;
  }
  if (!response.ok) {
    throw new PublicApiError(response.status, typeof body === 'object' && body !== null ? (body as never) : {});
  }
  return body as T;
}

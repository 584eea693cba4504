import { ApiError } from '@/lib/api-error';

// The server names the day as routeDayId (or mailIn, stopId); the form has one choice for all three.
const FIELD_ALIASES: Record<string, string> = { routeDayId: 'choice', mailIn: 'choice', stopId: 'choice' };
const NOT_FIELDS = new Set(['nextRouteDayId', 'website', 'idempotencyKey']);

/** The server's field messages keyed by the form's paths ("items[0].count" becomes "items.0.count"). */
export function formErrorsFrom(error: unknown): Record<string, string> {
  if (!(error instanceof ApiError)) return {};
  const errors: Record<string, string> = {};
  for (const [field, messages] of Object.entries(error.fields)) {
    if (NOT_FIELDS.has(field)) continue;
    const path = field.replace(/\[(\d+)\]/g, '.$1');
    const key = FIELD_ALIASES[path] ?? path;
    errors[key] = [errors[key], ...messages].filter(Boolean).join(' ');
  }
  return errors;
}

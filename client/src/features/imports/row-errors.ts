import type { FieldErrors } from '@/lib/api-error';
import type { ImportRowError } from './types';

const ROW_FIELD = /^rows\.(\d+)(?:\.(.+))?$/;

/** A refused commit sends its row problems as fields "rows.12.email" (or "rows.12"); back to one list by row. */
export function rowErrorsFromFields(fields: FieldErrors): ImportRowError[] {
  const errors: ImportRowError[] = [];
  for (const [field, messages] of Object.entries(fields)) {
    const match = ROW_FIELD.exec(field);
    if (!match) continue;
    for (const message of messages) errors.push({ row: Number(match[1]), column: match[2] ?? null, message });
  }
  return errors.sort((a, b) => a.row - b.row);
}

import { isEdgeType, isToolKind, type EdgeType, type ToolKind } from '@keenroute/shared';
import type { BookingItem } from './types';

/** The most pairs one row may hold (the server's limit too). */
export const MAX_PAIRS_PER_ROW = 50;
export const MAX_ROWS = 12;
export const NAME_MAX = 120;
export const NOTES_MAX = 1000;
export const MAIL_IN = 'mail-in';

/** One row of the shears editor: a tool kind, an edge type and how many pairs. */
export interface ItemRow {
  key: string;
  toolKind: ToolKind | '';
  edgeType: EdgeType | '';
  count: number | string;
}

let rowSerial = 0;

// Straight convex hair shears are the most common pair brought in (common practice), so a new row starts there.
export function newRow(item?: BookingItem): ItemRow {
  rowSerial += 1;
  return {
    key: `row-${rowSerial}`,
    toolKind: item?.toolKind ?? 'straight',
    edgeType: item?.edgeType ?? 'convex',
    count: item?.count ?? 1,
  };
}

function isValidCount(count: number | string): count is number {
  return typeof count === 'number' && Number.isInteger(count) && count >= 1 && count <= MAX_PAIRS_PER_ROW;
}

/** The rows as the API takes them, or null while any row is incomplete. */
export function itemsOf(rows: readonly ItemRow[]): BookingItem[] | null {
  if (rows.length === 0) return null;
  const items: BookingItem[] = [];
  for (const row of rows) {
    if (!isToolKind(row.toolKind) || !isEdgeType(row.edgeType) || !isValidCount(row.count)) return null;
    items.push({ toolKind: row.toolKind, edgeType: row.edgeType, count: row.count });
  }
  return items;
}

export function validateRows(rows: readonly ItemRow[]): Record<string, string> {
  const errors: Record<string, string> = {};
  if (rows.length === 0) errors.items = 'Add at least one row of shears.';
  rows.forEach((row, index) => {
    if (!isToolKind(row.toolKind)) errors[`items.${index}.toolKind`] = 'Choose the kind of shear.';
    if (!isEdgeType(row.edgeType)) errors[`items.${index}.edgeType`] = 'Choose the edge type.';
    if (!isValidCount(row.count)) {
      errors[`items.${index}.count`] = `Enter how many pairs, a whole number from 1 to ${MAX_PAIRS_PER_ROW}.`;
    }
  });
  return errors;
}

const LINE_BREAK = /[\r\n]/;
// A simple shape check; the server has the last word and the confirmation e-mail proves the address.
const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

export function nameError(name: string): string | null {
  const trimmed = name.trim();
  if (trimmed === '') return 'Enter your name, so the sharpener knows whose shears these are.';
  if (trimmed.length > NAME_MAX) return `Keep the name to ${NAME_MAX} characters.`;
  if (LINE_BREAK.test(name)) return 'The name must fit on one line.';
  return null;
}

export function emailError(email: string): string | null {
  const trimmed = email.trim();
  if (trimmed === '') return 'Enter your e-mail address: the confirmation and its change link go there.';
  if (!EMAIL.test(trimmed) || LINE_BREAK.test(email)) return 'Enter an e-mail address like name@salon.com.';
  return null;
}

export function phoneError(phone: string): string | null {
  const trimmed = phone.trim();
  if (trimmed === '') return 'Enter a phone number the sharpener can call on the day.';
  const digits = trimmed.replace(/\D/g, '').length;
  if (!/^\+?[\d\s().-]+$/.test(trimmed) || digits < 7 || digits > 15) {
    return 'Enter a phone number of 7 to 15 digits, like 541 555 0134.';
  }
  return null;
}

export function notesError(notes: string): string | null {
  return notes.length > NOTES_MAX ? `Keep the notes to ${NOTES_MAX} characters.` : null;
}

/** A v4 UUID; crypto.randomUUID exists only on secure pages, so the fallback builds one from random bytes. */
export function newIdempotencyKey(): string {
  if (typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  bytes[6] = (bytes[6]! & 0x0f) | 0x40;
  bytes[8] = (bytes[8]! & 0x3f) | 0x80;
  const hex = Array.from(bytes, (byte) => byte.toString(16).padStart(2, '0')).join('');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}

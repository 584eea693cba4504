/**
 * Input no DTO validator looks for but that breaks things further down, found in any body, query or path value:
 * - NUL characters: PostgreSQL cannot store them in text and answers 22021, which would surface as a 500;
 * - lone surrogates: not valid Unicode; silently turned into U+FFFD on the way to the database, and in an e-mail
 *   address they failed the request with a 500;
 * - bidirectional embeddings, overrides and isolates (U+202A-U+202E, U+2066-U+2069): a stop or customer name with one
 *   shows its letters in another order than it holds them, on screen and on invoices ("Salon \u202Egnp.exe" reads
 *   "Salon exe.png"). Right-to-left names need none of them: their letters carry their direction;
 * - `__proto__`, `constructor` and `prototype` keys: class-transformer would assign them, swapping the DTO's prototype
 *   and slipping past the whitelist.
 */
export const NUL_MESSAGE = 'Text cannot contain NUL characters.';
export const BROKEN_UNICODE_MESSAGE = 'Text contains a broken character (a lone surrogate); paste it again.';
export const BIDI_CONTROL_MESSAGE =
  'Text cannot contain direction-override characters (U+202A to U+202E, U+2066 to U+2069); type it again without them.';
export const PROTOTYPE_KEY_MESSAGE = (key: string) => `property ${key} should not exist`;

const PROTOTYPE_KEYS = new Set(['__proto__', 'constructor', 'prototype']);
const BIDI_CONTROL = /[\u202A-\u202E\u2066-\u2069]/;
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;
/** Deeper than any DTO nests; a body built to go deeper is refused rather than walked. */
const MAX_DEPTH = 32;

/** True when the text holds a bidirectional embedding, override or isolate; CSV imports refuse those cells too. */
export function hasBidiControl(text: string): boolean {
  return BIDI_CONTROL.test(text);
}

function add(fields: Record<string, string[]>, path: string, message: string): void {
  const key = path || 'body';
  const messages = (fields[key] ??= []);
  if (!messages.includes(message)) messages.push(message);
}

function checkText(text: string, path: string, fields: Record<string, string[]>): void {
  if (text.includes('\u0000')) add(fields, path, NUL_MESSAGE);
  if (LONE_SURROGATE.test(text)) add(fields, path, BROKEN_UNICODE_MESSAGE);
  if (hasBidiControl(text)) add(fields, path, BIDI_CONTROL_MESSAGE);
}

function walk(value: unknown, path: string, depth: number, fields: Record<string, string[]>): void {
  if (typeof value === 'string') return checkText(value, path, fields);
  if (typeof value !== 'object' || value === null || Buffer.isBuffer(value)) return;
  if (depth >= MAX_DEPTH) {
    add(fields, path, 'This is nested too deeply.');
    return;
  }
  for (const key of Object.keys(value)) {
    const inner = path ? `${path}.${key}` : key;
    if (PROTOTYPE_KEYS.has(key)) add(fields, inner, PROTOTYPE_KEY_MESSAGE(key));
    checkText(key, inner, fields);
    walk((value as Record<string, unknown>)[key], inner, depth + 1, fields);
  }
}

/** Field paths ("customer.name", "items.0.notes") with what is wrong there; empty when the value is safe. */
export function unsafeInput(value: unknown, path = ''): Record<string, string[]> {
  // No prototype: a "__proto__" field name must become a key of its own, not reach Object.prototype.
  const fields = Object.create(null) as Record<string, string[]>;
  walk(value, path, 0, fields);
  return fields;
}

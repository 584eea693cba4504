/** Tag codes: KR- and a serial of at least six digits (KR-000001 upward), printed on the shear's label. */
export const TAG_CODE_PREFIX = 'KR-';
export const TAG_CODE_DIGITS = 6;

const TAG_CODE = /^KR-(\d{6,})$/;

export function formatTagCode(serial: number): string {
  if (!Number.isSafeInteger(serial) || serial < 1) {
    throw new RangeError(`A tag serial is a whole number from 1 up; got ${serial}.`);
  }
  return `${TAG_CODE_PREFIX}${String(serial).padStart(TAG_CODE_DIGITS, '0')}`;
}

/** Reads a tag code as people type it: any case, spaces, with or without "KR-" and leading zeros ("kr 123"). */
export function normalizeTagCode(text: string): string | undefined {
  const compact = text.trim().toUpperCase().replace(/\s+/g, '');
  const digits = /^(?:KR-?)?(\d{1,12})$/.exec(compact)?.[1];
  if (!digits) return undefined;
  const serial = Number(digits);
  return serial >= 1 ? formatTagCode(serial) : undefined;
}

export const isTagCode = (value: unknown): value is string => typeof value === 'string' && TAG_CODE.test(value);

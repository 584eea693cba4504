import { normalizeTagCode } from '@keenroute/shared';

/** A tag label's QR code holds the tag code; a link or text around it is tolerated. */
export function readTagCode(scanned: string): string | undefined {
  const direct = normalizeTagCode(scanned);
  if (direct) return direct;
  const found = /KR-?\s*\d{1,12}/i.exec(scanned)?.[0];
  return found ? normalizeTagCode(found) : undefined;
}

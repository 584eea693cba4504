import { createHash, randomBytes } from 'node:crypto';

/** A fresh secret for a link or cookie, and the hash that is all the database ever keeps of it. */
export function newSecret(): { secret: string; hash: string } {
  const secret = randomBytes(32).toString('base64url');
  return { secret, hash: hashSecret(secret) };
}

export function hashSecret(secret: string): string {
  return createHash('sha256').update(secret).digest('hex');
}

import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '@keenroute/shared';
// Mozilla's list of common passwords, kept as an npm package.
import commonPasswords from 'fxa-common-password-list';

/** Why a new password is refused, in words for the person choosing it; null when it is acceptable. */
export function passwordProblem(password: string, email?: string): string | null {
  if (password.length < PASSWORD_MIN_LENGTH) {
    return `Use at least ${PASSWORD_MIN_LENGTH} characters.`;
  }
  if (Buffer.byteLength(password, 'utf8') > PASSWORD_MAX_LENGTH) {
    return `Use at most ${PASSWORD_MAX_LENGTH} bytes (fewer if you use accents or symbols).`;
  }
  const lowered = password.toLowerCase();
  if (commonPasswords.test(lowered) || commonPasswords.test(password)) {
    return 'That password is on a list of common passwords. Choose one that is harder to guess.';
  }
  if (email && lowered.includes(email.toLowerCase().split('@')[0]!) && lowered.length < 16) {
    return 'Do not build the password from your e-mail address.';
  }
  return null;
}

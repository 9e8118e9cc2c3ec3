import commonPasswords from 'fxa-common-password-list';
import { MIN_PASSWORD_LENGTH } from '@broodsilk/shared';

export const MAX_PASSWORD_LENGTH = 200;

/**
 * Why a new password is refused, or null when it is acceptable (OWASP ASVS 5.0 V6.2: a minimum
 * length, no composition rules, and a check against a list of commonly used passwords).
 * Passwords are kept exactly as typed (no trimming), so one made only of blanks or control
 * characters is refused rather than rewritten.
 */
export function passwordProblem(password: string): string | null {
  if ([...password].length < MIN_PASSWORD_LENGTH) return `Use a password of at least ${MIN_PASSWORD_LENGTH} characters.`;
  if ([...password].length > MAX_PASSWORD_LENGTH) return `Use a password of at most ${MAX_PASSWORD_LENGTH} characters.`;
  if (/^[\s\p{C}]*$/u.test(password)) return 'Use a password with letters, digits or symbols, not only spaces or control characters.';
  if (commonPasswords.test(password) || commonPasswords.test(password.toLowerCase())) {
    return 'This password is on a list of commonly used passwords. Choose another one.';
  }
  return null;
}

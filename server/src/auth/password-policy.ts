import commonPasswords from 'fxa-common-password-list';
import { MIN_PASSWORD_LENGTH } from '@broodsilk/shared';
import { refusal, type RefusalKey } from '../common/refusal';

export const MAX_PASSWORD_LENGTH = 200;

/** What the policy can find wrong with a new password, each one sentence of the catalogue. */
export type PasswordProblem = 'passwordTooShort' | 'passwordTooLong' | 'passwordBlank' | 'passwordCommon';

export const PASSWORD_LIMITS = { min: MIN_PASSWORD_LENGTH, max: MAX_PASSWORD_LENGTH } as const;

/**
 * Why a new password is refused, or null when it is acceptable (OWASP ASVS 5.0 V6.2: a minimum
 * length, no composition rules, and a check against a list of commonly used passwords).
 * Passwords are kept exactly as typed (no trimming), so one made only of blanks or control
 * characters is refused rather than rewritten. At most one problem, the first in this order.
 */
export function passwordProblem(password: string): PasswordProblem | null {
  if ([...password].length < MIN_PASSWORD_LENGTH) return 'passwordTooShort';
  if ([...password].length > MAX_PASSWORD_LENGTH) return 'passwordTooLong';
  if (/^[\s\p{C}]*$/u.test(password)) return 'passwordBlank';
  if (commonPasswords.test(password) || commonPasswords.test(password.toLowerCase())) return 'passwordCommon';
  return null;
}

/** Each problem's sentence in the catalogue (and the one for no password at all). */
export const PASSWORD_REFUSALS: Readonly<Record<PasswordProblem | 'passwordMissing', RefusalKey>> = {
  passwordMissing: 'auth.passwordMissing',
  passwordTooShort: 'auth.passwordTooShort',
  passwordTooLong: 'auth.passwordTooLong',
  passwordBlank: 'auth.passwordBlank',
  passwordCommon: 'auth.passwordCommon',
};

/** The problem as a keyed refusal (English message, catalogue key and values). */
export const passwordRefusal = (problem: PasswordProblem | 'passwordMissing') => refusal(PASSWORD_REFUSALS[problem], PASSWORD_LIMITS);

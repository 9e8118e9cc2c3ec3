import { createHash } from 'node:crypto';
import { Secret } from 'otpauth';
import { RECOVERY_CODE_COUNT } from '@broodsilk/shared';

const GROUP = 4;

/**
 * Ten codes of 120 random bits each, in base32 (RFC 4648) groups of four: `abcd-efgh-…`.
 * With at least 112 bits of entropy a plain SHA-256 may store them (OWASP ASVS 5.0 V6.5.2).
 */
export function newRecoveryCodes(): string[] {
  return Array.from({ length: RECOVERY_CODE_COUNT }, () => {
    const text = new Secret({ size: 15 }).base32.toLowerCase();
    return text.match(new RegExp(`.{${GROUP}}`, 'g'))!.join('-');
  });
}

/** The code as stored: letters and digits only, lower case; null when it cannot be a recovery code. */
export function recoveryCodeHash(typed: string): string | null {
  const plain = typed.replace(/[\s-]/g, '').toLowerCase();
  if (!/^[a-z2-7]{24}$/.test(plain)) return null;
  return createHash('sha256').update(plain).digest('hex');
}

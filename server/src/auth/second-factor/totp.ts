import { Secret, TOTP } from 'otpauth';
import { APP_NAME, TOTP_DIGITS, TOTP_PERIOD_SECONDS } from '@broodsilk/shared';

/** How many 30-second steps either side of now still count, for a phone clock a little off (RFC 6238 §5.2). */
const DRIFT_STEPS = 1;

function totp(secretBase32: string, account = ''): TOTP {
  return new TOTP({
    issuer: APP_NAME,
    label: account,
    algorithm: 'SHA1',
    digits: TOTP_DIGITS,
    period: TOTP_PERIOD_SECONDS,
    secret: Secret.fromBase32(secretBase32),
  });
}

/** A new 160-bit secret (RFC 4226 §4 recommends 160 bits), base32 as authenticator apps take it. */
export function newTotpSecret(): string {
  return new Secret({ size: 20 }).base32;
}

/** The otpauth:// URI an authenticator app reads from the QR code. */
export function totpUri(secretBase32: string, account: string): string {
  return totp(secretBase32, account).toString();
}

/**
 * The time step of a right code, or null. A step at or before `lastStep` was used already and
 * is refused, so a code seen over someone's shoulder cannot be replayed (OWASP ASVS 5.0 V6.5.1).
 */
export function acceptedTotpStep(secretBase32: string, code: string, now: Date, lastStep: number | null): number | null {
  if (!new RegExp(`^\\d{${TOTP_DIGITS}}$`).test(code)) return null;
  const delta = totp(secretBase32).validate({ token: code, timestamp: now.getTime(), window: DRIFT_STEPS });
  if (delta === null) return null;
  const step = Math.floor(now.getTime() / 1000 / TOTP_PERIOD_SECONDS) + delta;
  return lastStep !== null && step <= lastStep ? null : step;
}

import { randomBytes } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { validateEnv } from './validate-env';

const secret = () => randomBytes(32).toString('hex');
const good = () => ({
  JWT_SECRET: secret(),
  CSRF_SECRET: secret(),
  CALENDAR_SECRET: secret(),
  TOTP_ENCRYPTION_KEY: secret(),
  DATABASE_URL: 'postgres://app@127.0.0.1:5432/broodsilk',
});

describe('validateEnv', () => {
  it('accepts a complete set, with the TOTP key as hex or as base64url (as start.sh writes it)', () => {
    expect(() => validateEnv(good())).not.toThrow();
    expect(() => validateEnv({ ...good(), TOTP_ENCRYPTION_KEY: randomBytes(32).toString('base64url') })).not.toThrow();
  });

  it('refuses to start without a 32-byte TOTP_ENCRYPTION_KEY (AES-256 needs exactly 256 bits)', () => {
    const { TOTP_ENCRYPTION_KEY: _dropped, ...rest } = good();
    expect(() => validateEnv(rest)).toThrow(/TOTP_ENCRYPTION_KEY/);
    expect(() => validateEnv({ ...good(), TOTP_ENCRYPTION_KEY: randomBytes(16).toString('hex') })).toThrow(/TOTP_ENCRYPTION_KEY/);
  });
});

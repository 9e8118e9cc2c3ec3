import { Secret, TOTP } from 'otpauth';
import { describe, expect, it } from 'vitest';
import { acceptedTotpStep, newTotpSecret } from './totp';
import { openSecret, sealSecret } from './totp-secret-box';
import { readTotpKey } from '../../config/totp-key';
import { newRecoveryCodes, recoveryCodeHash } from './recovery-codes';

/** RFC 6238 Appendix B: the SHA-1 seed "12345678901234567890" and its 8-digit codes at these Unix times. */
const RFC6238_SHA1 = [
  { time: 59, code: '94287082' },
  { time: 1111111109, code: '07081804' },
  { time: 1111111111, code: '14050471' },
  { time: 1234567890, code: '89005924' },
  { time: 2000000000, code: '69279037' },
  { time: 20000000000, code: '65353130' },
];
const RFC_SECRET = Secret.fromUTF8('12345678901234567890');

describe('TOTP codes (RFC 6238 Appendix B test vectors)', () => {
  it('the library computes the published 8-digit codes', () => {
    const totp = new TOTP({ secret: RFC_SECRET, algorithm: 'SHA1', digits: 8, period: 30 });
    for (const v of RFC6238_SHA1) expect(totp.generate({ timestamp: v.time * 1000 }), `T=${v.time}`).toBe(v.code);
  });

  it('our six-digit check accepts the last six digits of each vector (RFC 4226 §5.3: the code is the value mod 10^digits) and names its step', () => {
    for (const v of RFC6238_SHA1) {
      const step = acceptedTotpStep(RFC_SECRET.base32, v.code.slice(2), new Date(v.time * 1000), null);
      expect(step, `T=${v.time}`).toBe(Math.floor(v.time / 30));
    }
  });

  it('refuses a wrong code, a code from a step already used, and anything but six digits', () => {
    const at = new Date(59_000);
    expect(acceptedTotpStep(RFC_SECRET.base32, '287083', at, null)).toBeNull();
    expect(acceptedTotpStep(RFC_SECRET.base32, '287082', at, 1)).toBeNull();
    expect(acceptedTotpStep(RFC_SECRET.base32, '287082', at, 0)).toBe(1);
    expect(acceptedTotpStep(RFC_SECRET.base32, '94287082', at, null)).toBeNull();
    expect(acceptedTotpStep(RFC_SECRET.base32, '28708a', at, null)).toBeNull();
  });

  it('accepts one step of clock drift either side, not two (RFC 6238 §5.2)', () => {
    const t = 1111111109;
    const code = RFC6238_SHA1[1].code.slice(2);
    expect(acceptedTotpStep(RFC_SECRET.base32, code, new Date((t + 30) * 1000), null)).toBe(Math.floor(t / 30));
    expect(acceptedTotpStep(RFC_SECRET.base32, code, new Date((t + 61) * 1000), null)).toBeNull();
  });

  it('new secrets are 160 bits (RFC 4226 §4), 32 base32 characters, and differ', () => {
    const a = newTotpSecret();
    expect(a).toMatch(/^[A-Z2-7]{32}$/);
    expect(newTotpSecret()).not.toBe(a);
  });
});

describe('the sealed secret (AES-256-GCM, NIST SP 800-38D)', () => {
  const key = readTotpKey('7f3c1e9a5b2d4f6081a3c5e7092b4d6f8a1c3e5f7092b4d6e8f0a2c4e6081a3c')!;

  it('opens to the secret for its own account only, and a changed byte fails the tag', () => {
    const sealed = sealSecret(key, 'user-a', 'JBSWY3DPEHPK3PXP');
    expect(sealed).not.toContain('JBSWY3DPEHPK3PXP');
    expect(openSecret(key, 'user-a', sealed)).toBe('JBSWY3DPEHPK3PXP');
    expect(() => openSecret(key, 'user-b', sealed)).toThrow();
    const tampered = sealed.slice(0, -2) + (sealed.endsWith('A') ? 'BA' : 'AA');
    expect(() => openSecret(key, 'user-a', tampered)).toThrow();
    expect(() => openSecret(readTotpKey('0'.repeat(64))!, 'user-a', sealed)).toThrow();
  });

  it('takes 32 bytes as 64 hex digits or 43 base64url characters, nothing else', () => {
    expect(readTotpKey('ab'.repeat(32))?.length).toBe(32);
    expect(readTotpKey(Buffer.alloc(32, 7).toString('base64url'))?.length).toBe(32);
    expect(readTotpKey('ab'.repeat(31))).toBeNull();
    expect(readTotpKey('')).toBeNull();
  });
});

describe('recovery codes', () => {
  it('ten different codes of 24 base32 characters (120 bits), read with or without dashes and in any case', () => {
    const codes = newRecoveryCodes();
    expect(new Set(codes).size).toBe(10);
    for (const c of codes) expect(c).toMatch(/^([a-z2-7]{4}-){5}[a-z2-7]{4}$/);
    expect(recoveryCodeHash(codes[0].toUpperCase().replace(/-/g, ' '))).toBe(recoveryCodeHash(codes[0]));
    expect(recoveryCodeHash('123456')).toBeNull();
  });
});

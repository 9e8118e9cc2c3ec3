import { describe, expect, it } from 'vitest';
import { readUnsubscribeToken, unsubscribeToken } from './unsubscribe-token';

const secret = 'a-test-secret-of-some-length';
const user = '0b5d1e0c-3f1a-4c55-9d7e-2a1f3c4b5d6e';

describe('unsubscribe token', () => {
  it('reads back the user and kind it was made for', () => {
    expect(readUnsubscribeToken(secret, unsubscribeToken(secret, user, 'roll-due'))).toEqual({ userId: user, kind: 'roll-due' });
  });

  it('refuses every other spelling of the last character, including those that decode to the same bytes', () => {
    // RFC 4648 §3.5: a 32-byte value in base64 leaves 2 spare bits in its last character, which decoders ignore.
    const token = unsubscribeToken(secret, user, 'roll-due');
    const alphabet = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_';
    const accepted = [...alphabet].filter((c) => readUnsubscribeToken(secret, token.slice(0, -1) + c) !== null);
    expect(accepted).toEqual([token.slice(-1)]);
  });

  it('refuses a token made under another secret or for another kind', () => {
    expect(readUnsubscribeToken('another-secret', unsubscribeToken(secret, user, 'roll-due'))).toBeNull();
    const [u, , m] = unsubscribeToken(secret, user, 'roll-due').split('.');
    expect(readUnsubscribeToken(secret, `${u}.daily-digest.${m}`)).toBeNull();
  });
});

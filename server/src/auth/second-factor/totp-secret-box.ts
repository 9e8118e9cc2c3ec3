import { createCipheriv, createDecipheriv, randomBytes } from 'node:crypto';

const ALGORITHM = 'aes-256-gcm';
const VERSION = 'v1';

/**
 * Seals a TOTP secret for the database with AES-256-GCM (NIST SP 800-38D): a fresh 96-bit nonce
 * per secret, the user id as additional data so a sealed secret copied onto another account does
 * not open. Stored as `v1.<nonce>.<tag>.<ciphertext>` in base64url.
 */
export function sealSecret(key: Buffer, userId: string, secret: string): string {
  const iv = randomBytes(12);
  const cipher = createCipheriv(ALGORITHM, key, iv);
  cipher.setAAD(Buffer.from(userId));
  const body = Buffer.concat([cipher.update(secret, 'utf8'), cipher.final()]);
  return [VERSION, iv, cipher.getAuthTag(), body].map((p) => (typeof p === 'string' ? p : p.toString('base64url'))).join('.');
}

/** Opens a sealed secret; throws when the key, the account or the text does not match. */
export function openSecret(key: Buffer, userId: string, sealed: string): string {
  const [version, iv, tag, body] = sealed.split('.');
  if (version !== VERSION || !iv || !tag || body === undefined) throw new Error('not a sealed TOTP secret');
  const decipher = createDecipheriv(ALGORITHM, key, Buffer.from(iv, 'base64url'));
  decipher.setAAD(Buffer.from(userId));
  decipher.setAuthTag(Buffer.from(tag, 'base64url'));
  return Buffer.concat([decipher.update(Buffer.from(body, 'base64url')), decipher.final()]).toString('utf8');
}

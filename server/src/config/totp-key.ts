/** TOTP_ENCRYPTION_KEY: 32 random bytes as 64 hexadecimal digits or 43 base64url characters (as start.sh writes it). */
export function readTotpKey(text: string | undefined): Buffer | null {
  if (!text) return null;
  if (/^[0-9a-f]{64}$/i.test(text)) return Buffer.from(text, 'hex');
  return /^[A-Za-z0-9_-]{43}$/.test(text) ? Buffer.from(text, 'base64url') : null;
}

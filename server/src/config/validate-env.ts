import { parseTrustProxy } from './trust-proxy';
import { readTotpKey } from './totp-key';

/**
 * Checked once at start so a misconfigured instance fails loudly instead of
 * signing sessions with an empty secret.
 */
export function validateEnv(env: Record<string, unknown>): Record<string, unknown> {
  const problems: string[] = [];
  for (const key of ['JWT_SECRET', 'CSRF_SECRET', 'CALENDAR_SECRET']) {
    const value = env[key];
    if (typeof value !== 'string' || value.length < 32) {
      problems.push(`${key} must be set to a random string of at least 32 characters`);
    }
  }
  if (!readTotpKey(typeof env.TOTP_ENCRYPTION_KEY === 'string' ? env.TOTP_ENCRYPTION_KEY : undefined)) {
    problems.push('TOTP_ENCRYPTION_KEY must be set to 32 random bytes (64 hexadecimal digits or 43 base64url characters)');
  }
  if (typeof env.DATABASE_URL !== 'string' || !env.DATABASE_URL.startsWith('postgres')) {
    problems.push('DATABASE_URL must be a postgres:// connection URL');
  }
  try {
    parseTrustProxy(typeof env.TRUST_PROXY === 'string' ? env.TRUST_PROXY : undefined);
  } catch (e) {
    problems.push((e as Error).message);
  }
  if (problems.length) throw new Error(`Configuration error:\n- ${problems.join('\n- ')}`);
  return env;
}

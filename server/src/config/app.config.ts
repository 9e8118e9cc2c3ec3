import { registerAs } from '@nestjs/config';

export const appConfig = registerAs('app', () => ({
  port: Number(process.env.PORT ?? 3000),
  host: process.env.HOST ?? '127.0.0.1',
  /** Public base URL used in e-mailed links. */
  publicUrl: process.env.PUBLIC_URL ?? `http://127.0.0.1:${process.env.PORT ?? 3000}`,
  jwtSecret: process.env.JWT_SECRET ?? '',
  csrfSecret: process.env.CSRF_SECRET ?? '',
  /** Derives calendar feed tokens; its own key, not the session-signing one. */
  calendarSecret: process.env.CALENDAR_SECRET ?? '',
  /** Encrypts TOTP secrets at rest (AES-256-GCM): 64 hexadecimal digits. */
  totpEncryptionKey: process.env.TOTP_ENCRYPTION_KEY ?? '',
  /** Folder of the built client, served at `/`. Empty disables static serving. */
  clientDist: process.env.CLIENT_DIST ?? '',
  secureCookies: process.env.SECURE_COOKIES === 'true',
  authRateLimit: Number(process.env.AUTH_RATE_LIMIT ?? 20),
  authRateWindowMs: Number(process.env.AUTH_RATE_WINDOW_MS ?? 60_000),
}));

export type AppConfig = ReturnType<typeof appConfig>;

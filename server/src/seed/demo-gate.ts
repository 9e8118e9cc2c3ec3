/**
 * The demo's four accounts share a published password, so they may only ever exist on a
 * machine nobody else reaches: `npm start` with its own local database. The operator's own
 * DATABASE_URL (start.sh then leaves BROODSILK_DEMO unset) or any address that is not loopback
 * means a real install, which gets no demo accounts.
 */
export function demoRefusal(env: NodeJS.ProcessEnv = process.env): string | null {
  if (env.BROODSILK_DEMO !== '1') return 'BROODSILK_DEMO=1 is not set (npm start sets it only with its own local database)';
  if (!isLoopbackUrl(env.DATABASE_URL)) return 'DATABASE_URL does not point at this machine (127.0.0.1, ::1 or localhost)';
  if (env.PUBLIC_URL !== undefined && !isLoopbackUrl(env.PUBLIC_URL)) return 'PUBLIC_URL is not a loopback address';
  return null;
}

/** True when the demo is allowed on this install (see demoRefusal). */
export const isLocalDemo = (env: NodeJS.ProcessEnv = process.env): boolean => demoRefusal(env) === null;

/** True for a URL whose host is the loopback interface (RFC 5735 127.0.0.0/8, RFC 4291 ::1, "localhost"). */
export function isLoopbackUrl(text: string | undefined): boolean {
  if (!text) return false;
  let host: string;
  try {
    host = new URL(text).hostname.toLowerCase();
  } catch {
    return false;
  }
  return host === 'localhost' || host === '[::1]' || /^127\.\d{1,3}\.\d{1,3}\.\d{1,3}$/.test(host);
}

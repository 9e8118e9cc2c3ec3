import { isIP } from 'node:net';

const NAMED = new Set(['loopback', 'linklocal', 'uniquelocal']);

/**
 * Express's `trust proxy` from TRUST_PROXY: which proxies may tell the app the client's address
 * and protocol (X-Forwarded-For / -Proto). Default `loopback` (a proxy on the same machine).
 * Accepted: `false` (no proxy), a hop count (1-10), or a comma list of addresses, CIDR ranges and
 * the names loopback, linklocal, uniquelocal. `true` (trust anyone) is refused: any client could
 * then forge its address and dodge the sign-in limits.
 */
export function parseTrustProxy(text: string | undefined): string | number | false {
  const value = (text ?? '').trim();
  if (value === '') return 'loopback';
  if (value === 'false') return false;
  if (/^\d+$/.test(value)) {
    const hops = Number(value);
    if (hops >= 1 && hops <= 10) return hops;
    throw new Error(`TRUST_PROXY: a hop count must be 1 to 10, not ${value}`);
  }
  const parts = value.split(',').map((p) => p.trim());
  for (const part of parts) {
    if (NAMED.has(part)) continue;
    const [address, prefix, extra] = part.split('/');
    const family = isIP(address ?? '');
    const bits = family === 4 ? 32 : 128;
    const prefixOk = prefix === undefined || (/^\d+$/.test(prefix) && Number(prefix) <= bits);
    if (!family || !prefixOk || extra !== undefined) {
      throw new Error(`TRUST_PROXY: "${part}" is not an IP address, CIDR range or one of loopback, linklocal, uniquelocal (or use false, or a hop count 1-10)`);
    }
  }
  return parts.join(',');
}

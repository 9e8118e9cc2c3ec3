/** Exact fractions of BigInts, for shares and their explanations. */

export function gcd(a: bigint, b: bigint): bigint {
  let x = a < 0n ? -a : a;
  let y = b < 0n ? -b : b;
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
}

/** "35/3", or "12" when the fraction is whole. The denominator must be positive. */
export function formatFraction(num: bigint, den: bigint): string {
  if (den <= 0n) throw new RangeError('A fraction needs a positive denominator.');
  const g = gcd(num, den) || 1n;
  const n = num / g;
  const d = den / g;
  return d === 1n ? `${n}` : `${n}/${d}`;
}

/** Decimal for display only, rounded half up to `places` (default 2): 35/3 → "11.67". */
export function approxFraction(num: bigint, den: bigint, places = 2): string {
  if (den <= 0n) throw new RangeError('A fraction needs a positive denominator.');
  if (num < 0n) return `-${approxFraction(-num, den, places)}`;
  const scale = 10n ** BigInt(places);
  const scaled = (num * scale * 2n + den) / (2n * den);
  if (places === 0) return `${scaled}`;
  const whole = scaled / scale;
  const part = (scaled % scale).toString().padStart(places, '0');
  return `${whole}.${part}`;
}

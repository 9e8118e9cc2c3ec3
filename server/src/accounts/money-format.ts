/** Digits after the decimal point for an ISO 4217 currency (EUR 2, JPY 0), from the runtime's ICU data. */
export function minorDigits(currency: string): number {
  try {
    return new Intl.NumberFormat('en', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
  } catch {
    return 2;
  }
}

/** "EUR 12.50" from 1250 minor units. */
export function formatMinor(minor: number, currency: string): string {
  const digits = minorDigits(currency);
  const sign = minor < 0 ? '-' : '';
  return `${currency} ${sign}${(Math.abs(minor) / 10 ** digits).toFixed(digits)}`;
}

/** Minor units per major unit of an ISO 4217 currency (100 for EUR, 1 for JPY, 1000 for KWD). */
export function minorDigits(currency: string, locale?: string): number {
  return new Intl.NumberFormat(locale, { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
}

/** Integer minor units as money, e.g. 1200 EUR → "€12.00", 1200 JPY → "¥1,200". */
export function formatMoney(minor: number, currency: string, locale?: string): string {
  const format = new Intl.NumberFormat(locale, { style: 'currency', currency });
  const digits = format.resolvedOptions().maximumFractionDigits ?? 2;
  return format.format(minor / 10 ** digits);
}

/** A typed amount in major units ("12.5") as integer minor units; NaN when it is not a number. */
export function toMinor(major: number | string, currency: string): number {
  const n = typeof major === 'number' ? major : Number(String(major).replace(',', '.'));
  if (!Number.isFinite(n)) return Number.NaN;
  return Math.round(n * 10 ** minorDigits(currency));
}

/** Minor units as a plain number in major units, for a number field's start value. */
export function toMajor(minor: number, currency: string): number {
  return minor / 10 ** minorDigits(currency);
}

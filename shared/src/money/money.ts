/**
 * Money is kept as integer minor units with an ISO 4217 code. How many digits a currency has
 * after the decimal point (EUR 2, JPY 0, KWD 3) is the ISO 4217 "minor unit", taken from the
 * runtime's ICU data through Intl so no table of our own can drift from it.
 */
import { ruleText, type RuleText } from '../errors/rule-text.js';

/** Digits after the decimal point of an ISO 4217 currency: EUR 2, JPY 0, KWD 3. Throws a RangeError for a malformed code. */
export function minorDigits(currency: string): number {
  return new Intl.NumberFormat('en', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
}

/** Minor units as a plain number in major units (1250 EUR → 12.5), for a number field's start value. */
export function minorToMajor(minor: number, currency: string): number {
  return minor / 10 ** minorDigits(currency);
}

/** For screens: 1250 EUR → "€12.50", 1250 JPY → "¥1,250", in the reader's locale (or the given one). */
export function formatMoney(minor: number, currency: string, locale?: string): string {
  return new Intl.NumberFormat(locale, { style: 'currency', currency }).format(minorToMajor(minor, currency));
}

/** For files (statement PDF and CSV): the code and the plain amount, 1450 EUR → "EUR 14.50", -5 EUR → "EUR -0.05". */
export function formatMoneyCode(minor: number, currency: string): string {
  const digits = minorDigits(currency);
  const sign = minor < 0 ? '-' : '';
  const abs = String(Math.abs(minor)).padStart(digits + 1, '0');
  const major = digits === 0 ? abs : `${abs.slice(0, -digits)}.${abs.slice(-digits)}`;
  return `${currency} ${sign}${major}`;
}

/** A typed amount kept exactly as minor units, or refused with a sentence a form can show next to the field. */
export type ParsedMoney = { ok: true; minor: number } | ({ ok: false } & RuleText);

const TYPED_AMOUNT = /^(-?)(\d+)(?:[.,](\d*))?$/;

const refused = (key: string, values?: Record<string, string | number>): ParsedMoney => ({ ok: false, ...ruleText(`money.${key}`, values) });

/**
 * "12.5" EUR → 1250. A comma counts as the decimal point. More decimals than the currency has
 * ("12.345" EUR, "5.5" JPY) are refused, never rounded; so is anything that is not a plain number.
 */
export function parseMoney(typed: number | string, currency: string): ParsedMoney {
  const text = (typeof typed === 'number' ? String(typed) : typed).trim();
  if (text === '') return refused('required');
  const match = TYPED_AMOUNT.exec(text);
  const digits = minorDigits(currency);
  if (!match) return refused('notNumber', { example: digits === 0 ? 1250 : 12.5 });
  const [, sign, whole, fraction = ''] = match;
  if (fraction.length > digits) return digits === 0 ? refused('wholeOnly', { currency }) : refused('decimals', { currency, count: digits });
  const minor = Number(`${sign}${whole}${fraction.padEnd(digits, '0')}`);
  if (!Number.isSafeInteger(minor)) return refused('tooLarge');
  return { ok: true, minor: minor === 0 ? 0 : minor };
}

/** A typed amount a form has already validated with `parseMoney`, as minor units; throws if it was not valid after all. */
export function toMinor(typed: number | string, currency: string): number {
  const parsed = parseMoney(typed, currency);
  if (!parsed.ok) throw new RangeError(parsed.message);
  return parsed.minor;
}

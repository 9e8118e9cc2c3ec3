/**
 * Reading a number as typed. The text stays as the user wrote it; a number outside the allowed
 * range, with too many decimals or not a number at all is refused with a message, never clamped,
 * rounded or cut.
 */

export type TypedNumber = { kind: 'empty' } | { kind: 'number'; value: number } | { kind: 'invalid'; message: string };

import i18next from 'i18next';
import { words } from '@/lib/i18n';
import { formatNumber } from '@/lib/numbers';

/** The reader's decimal mark: the German interface writes a comma, else the browser's locale decides. */
function browserDecimalSeparator(): string {
  const locale = i18next.language === 'de' ? 'de-DE' : typeof navigator === 'undefined' ? 'en-GB' : navigator.language || 'en-GB';
  return new Intl.NumberFormat(locale).formatToParts(1.5).find((p) => p.type === 'decimal')?.value ?? '.';
}

const PLAIN = /^[+-]?(\d+([.,]\d+)?|[.,]\d+)$/;

/** A point is always a decimal point; a comma only where the browser's locale writes decimals with one. */
export function readTypedNumber(text: string, decimalSeparator = browserDecimalSeparator()): TypedNumber {
  const typed = text.trim();
  if (typed === '') return { kind: 'empty' };
  if (!PLAIN.test(typed)) return { kind: 'invalid', message: words('page.shell.fields.notANumber', { typed, example: formatNumber(12.5) }) };
  if (typed.includes(',') && decimalSeparator !== ',') return { kind: 'invalid', message: words('page.shell.fields.noComma') };
  // Where decimals take a comma, "1.250" is usually one thousand two hundred and fifty: asked, never guessed.
  if (decimalSeparator === ',' && /^[+-]?\d{1,3}\.\d{3}$/.test(typed))
    return { kind: 'invalid', message: words('page.shell.fields.pointOrThousands', { typed }) };
  return { kind: 'number', value: Number(typed.replace(',', '.')) };
}

export interface NumberRule {
  required?: string;
  min?: number;
  max?: number;
  /** Decimal places allowed; 0 for whole numbers. Unlimited when absent. */
  decimals?: number;
  /** Said when the number is outside min..max; the default names the range. */
  rangeMessage?: string;
}

function decimalsOf(text: string): number {
  const fraction = text.trim().split(/[.,]/)[1];
  return fraction ? fraction.length : 0;
}

function outOfRange(value: number, rule: NumberRule): string {
  const values = {
    value: formatNumber(value),
    min: rule.min === undefined ? '' : formatNumber(rule.min),
    max: rule.max === undefined ? '' : formatNumber(rule.max),
  };
  if (rule.min !== undefined && rule.max !== undefined) return words('page.shell.fields.outOfRangeBetween', values);
  if (rule.min !== undefined) return words('page.shell.fields.outOfRangeMin', values);
  return words('page.shell.fields.outOfRangeMax', values);
}

/** The message for a typed number under a rule, or null when it is accepted as typed. */
export function checkNumber(text: string, rule: NumberRule = {}, decimalSeparator?: string): string | null {
  const read = readTypedNumber(text, decimalSeparator);
  if (read.kind === 'empty') return rule.required ?? null;
  if (read.kind === 'invalid') return read.message;
  if (rule.decimals === 0 && !Number.isInteger(read.value)) return words('page.shell.fields.wholeNumber');
  if (rule.decimals !== undefined && rule.decimals > 0 && decimalsOf(text) > rule.decimals)
    return words('page.shell.fields.decimals', { count: rule.decimals });
  if ((rule.min !== undefined && read.value < rule.min) || (rule.max !== undefined && read.value > rule.max))
    return rule.rangeMessage ?? outOfRange(read.value, rule);
  return null;
}

export const numberRule =
  (rule: NumberRule = {}) =>
  (text: string) =>
    checkNumber(text, rule);

/** The number of a checked field for the request, or null when empty. */
export function readNumber(text: string): number | null {
  const read = readTypedNumber(text);
  return read.kind === 'number' ? read.value : null;
}

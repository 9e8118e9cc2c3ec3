/**
 * Reading a number as typed. The text stays as the user wrote it; a number outside the allowed
 * range, with too many decimals or not a number at all is refused with a message, never clamped,
 * rounded or cut.
 */

export type TypedNumber = { kind: 'empty' } | { kind: 'number'; value: number } | { kind: 'invalid'; message: string };

function browserDecimalSeparator(): string {
  const locale = typeof navigator === 'undefined' ? 'en-GB' : navigator.language || 'en-GB';
  return new Intl.NumberFormat(locale).formatToParts(1.5).find((p) => p.type === 'decimal')?.value ?? '.';
}

const PLAIN = /^[+-]?(\d+([.,]\d+)?|[.,]\d+)$/;

/** A point is always a decimal point; a comma only where the browser's locale writes decimals with one. */
export function readTypedNumber(text: string, decimalSeparator = browserDecimalSeparator()): TypedNumber {
  const typed = text.trim();
  if (typed === '') return { kind: 'empty' };
  if (!PLAIN.test(typed)) return { kind: 'invalid', message: `"${typed}" is not a number. Write digits only, e.g. 12.5.` };
  if (typed.includes(',') && decimalSeparator !== ',')
    return { kind: 'invalid', message: 'Write the number without a comma; use a point for decimals, e.g. 12.5.' };
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

const show = (n: number) => n.toLocaleString('en-GB', { maximumFractionDigits: 20 });

function rangeText(rule: NumberRule): string {
  if (rule.min !== undefined && rule.max !== undefined) return `from ${show(rule.min)} to ${show(rule.max)}`;
  if (rule.min !== undefined) return `of at least ${show(rule.min)}`;
  return `of at most ${show(rule.max!)}`;
}

/** The message for a typed number under a rule, or null when it is accepted as typed. */
export function checkNumber(text: string, rule: NumberRule = {}, decimalSeparator?: string): string | null {
  const read = readTypedNumber(text, decimalSeparator);
  if (read.kind === 'empty') return rule.required ?? null;
  if (read.kind === 'invalid') return read.message;
  if (rule.decimals === 0 && !Number.isInteger(read.value)) return 'Give a whole number.';
  if (rule.decimals !== undefined && rule.decimals > 0 && decimalsOf(text) > rule.decimals)
    return `Give at most ${rule.decimals} decimal ${rule.decimals === 1 ? 'place' : 'places'}.`;
  if ((rule.min !== undefined && read.value < rule.min) || (rule.max !== undefined && read.value > rule.max))
    return rule.rangeMessage ?? `${show(read.value)} is out of range: give a number ${rangeText(rule)}.`;
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

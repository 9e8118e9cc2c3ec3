import { words } from '@/lib/i18n';
import { formatNumber } from '@/lib/numbers';

/** Length limits for text fields: shown as a counter near the limit, refused (never cut) above it. */

export interface TextRule {
  required?: string;
  maxLength: number;
}

/** Counted as the server counts (UTF-16 code units, as class-validator's MaxLength does). */
export function checkText(text: string, rule: TextRule): string | null {
  if (text.trim() === '') return rule.required ?? null;
  if (text.length > rule.maxLength) return words('page.shell.fields.tooLong', { count: text.length - rule.maxLength, max: formatNumber(rule.maxLength) });
  return null;
}

export const textRule = (rule: TextRule) => (text: string) => checkText(text, rule);

/** The counter appears once four fifths of the limit are used. */
export function counterText(length: number, maxLength: number): string | null {
  if (length < maxLength * 0.8) return null;
  return words('page.shell.fields.counter', { length: formatNumber(length), max: formatNumber(maxLength) });
}

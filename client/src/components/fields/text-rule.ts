/** Length limits for text fields: shown as a counter near the limit, refused (never cut) above it. */

export interface TextRule {
  required?: string;
  maxLength: number;
}

/** Counted as the server counts (UTF-16 code units, as class-validator's MaxLength does). */
export function checkText(text: string, rule: TextRule): string | null {
  if (text.trim() === '') return rule.required ?? null;
  if (text.length > rule.maxLength)
    return `This is ${(text.length - rule.maxLength).toLocaleString('en-GB')} characters too long: keep it to ${rule.maxLength.toLocaleString('en-GB')}.`;
  return null;
}

export const textRule = (rule: TextRule) => (text: string) => checkText(text, rule);

/** The counter appears once four fifths of the limit are used. */
export function counterText(length: number, maxLength: number): string | null {
  if (length < maxLength * 0.8) return null;
  return `${length.toLocaleString('en-GB')} of ${maxLength.toLocaleString('en-GB')} characters`;
}

import { wordsFor } from '../i18n/words.js';

/** A sentence of a shared rule: its catalogue key (under `rule.`) and values, and its English rendering. */
export interface RuleText {
  key: string;
  values: Record<string, string | number>;
  /** English, for logs, mail and readers that do not render `key`. */
  message: string;
}

/** `rule.<key>` with its values, said in English as well (the `key`/`values` of `FieldError`). */
export function ruleText(key: string, values: Record<string, string | number> = {}): RuleText {
  const full = `rule.${key}`;
  return { key: full, values, message: wordsFor('en')(full, values) };
}

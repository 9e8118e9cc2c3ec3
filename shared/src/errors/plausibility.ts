import { ruleText, type RuleText } from './rule-text.js';

/**
 * Plausibility warnings: a value that is possible but unusual. The server answers 422 with one
 * `details` row per warning (field `acknowledgedWarnings`, `code`, message) and writes nothing;
 * the same request sent again with those codes in `acknowledgedWarnings` and a `warningReason`
 * is stored with the reason.
 */
export const PLAUSIBILITY_WARNINGS = [
  /** A pairing dated before the male's maturing molt. */
  'pairing-before-male-matured',
  /** A sac laid sooner after the last pairing than the species' minimum. */
  'sac-soon-after-pairing',
  /** A sac laid more than a year after the last pairing. */
  'sac-long-after-pairing',
  /** A sac with no pairing recorded before it. */
  'sac-without-pairing',
  /** A second open project on a female whose brood is still in progress. */
  'female-has-brood-in-progress',
  /** A count higher than the estimated count before it. */
  'count-above-estimate',
  /** An opening whose eggs are outside the species' usual eggs per sac. */
  'eggs-outside-species-range',
] as const;
export type PlausibilityWarningCode = (typeof PLAUSIBILITY_WARNINGS)[number];

/** One warning: its code (to acknowledge it) and its sentence (`rule.warning.*`, see `RuleText`). */
export interface PlausibilityWarning extends RuleText {
  code: PlausibilityWarningCode;
}

/** The warning `code`, said by `rule.warning.<sentence>` (the code itself unless a code has several sentences). */
export function plausibilityWarning(code: PlausibilityWarningCode, values: RuleText['values'], sentence: string = code): PlausibilityWarning {
  return { code, ...ruleText(`warning.${sentence}`, values) };
}

/** What a request that can raise warnings carries to have them accepted. */
export interface AcknowledgedWarnings {
  acknowledgedWarnings?: PlausibilityWarningCode[];
  /** Why the unusual value is right; stored on the record and shown with it. */
  warningReason?: string;
}

/** The field a warning row of a 422 answer names. */
export const WARNINGS_FIELD = 'acknowledgedWarnings';

/** The warnings not yet acknowledged; empty means the write may go ahead. */
export function unacknowledged(found: readonly PlausibilityWarning[], acknowledged: readonly string[] | undefined): PlausibilityWarning[] {
  const ok = new Set(acknowledged ?? []);
  return found.filter((w) => !ok.has(w.code));
}

import type { SacFact } from '../breeding/pairing.types.js';
import { plausibilityWarning, type PlausibilityWarning } from '../errors/plausibility.js';

export interface OpenProjectOfFemale {
  title: string;
  sacs: readonly SacFact[];
}

/**
 * A female raising a brood in one open project is not usually paired again in another: warn when
 * a second open project would start on her while a sac of hers is still developing (common practice).
 */
export function secondProjectWarnings(femaleLabel: string, open: readonly OpenProjectOfFemale[]): PlausibilityWarning[] {
  const busy = open.find((p) => p.sacs.some((s) => s.fate === 'developing'));
  if (!busy) return [];
  return [plausibilityWarning('female-has-brood-in-progress', { female: femaleLabel, project: busy.title })];
}

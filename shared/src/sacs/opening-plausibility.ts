import { plausibilityWarning, type PlausibilityWarning } from '../errors/plausibility.js';
import type { NumberRange } from '../collection/species.types.js';

/**
 * Every egg and young spider found at an opening against the species' usual eggs per sac (its own range,
 * else its group's; docs/trade-facts.md §6 and check value 8). Outside it is possible (a first
 * sac, a record clutch, a miscount), so it warns and never refuses.
 */
export function openingCountWarnings(total: number, usual: NumberRange, estimated: boolean): PlausibilityWarning[] {
  if (total >= usual.min && total <= usual.max) return [];
  const sentence = `${total < usual.min ? 'eggsFewer' : 'eggsMore'}${estimated ? 'About' : ''}`;
  return [plausibilityWarning('eggs-outside-species-range', { total, min: usual.min, max: usual.max }, sentence)];
}

import type { PlausibilityWarning } from '../errors/plausibility.js';
import type { NumberRange } from '../collection/species.types.js';

/**
 * Every egg and young spider found at an opening against the species' usual eggs per sac (its own range,
 * else its group's; docs/trade-facts.md §6 and check value 8). Outside it is possible (a first
 * sac, a record clutch, a miscount), so it warns and never refuses.
 */
export function openingCountWarnings(total: number, usual: NumberRange, estimated: boolean): PlausibilityWarning[] {
  if (total >= usual.min && total <= usual.max) return [];
  const counted = `${estimated ? 'About ' : ''}${total} eggs and young`;
  const side = total < usual.min ? 'fewer than' : 'more than';
  return [
    {
      code: 'eggs-outside-species-range',
      message: `${counted} is ${side} this species usually lays (${usual.min}–${usual.max} a sac). Check the count, or save it with a reason.`,
    },
  ];
}

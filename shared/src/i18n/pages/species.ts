import type { Widen } from '../catalogue-shape.js';

/** Page text: species pages (client/src/features/species). English first; German must fill the same keys. */
export const speciesEn = {} as const;

export const speciesDe: Widen<typeof speciesEn> = {};

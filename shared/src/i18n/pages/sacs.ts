import type { Widen } from '../catalogue-shape.js';

/** Page text: sac pages, incubator, opening, counts (client/src/features/sacs). English first; German must fill the same keys. */
export const sacsEn = {
  careLogOlder: 'Show older entries',
} as const;

export const sacsDe: Widen<typeof sacsEn> = {
  careLogOlder: 'Ältere Einträge anzeigen',
};

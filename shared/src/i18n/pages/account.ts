import type { Widen } from '../catalogue-shape.js';

/** Page text: shares, ledger, hand-overs, settlements (client/src/features/account). English first; German must fill the same keys. */
export const accountEn = {
  entriesLater: 'Show later entries',
  entriesNotAllShown: 'Only the entries shown below are offered here; show later entries to reach the newer ones.',
} as const;

export const accountDe: Widen<typeof accountEn> = {
  entriesLater: 'Spätere Einträge anzeigen',
  entriesNotAllShown: 'Hier stehen nur die unten angezeigten Einträge zur Wahl; zeigen Sie spätere Einträge an, um die neueren zu erreichen.',
};

import type { Widen } from '../catalogue-shape.js';

/** Page text: shares, ledger, hand-overs, settlements (client/src/features/account). English first; German must fill the same keys. */
export const accountEn = {} as const;

export const accountDe: Widen<typeof accountEn> = {};

import type { Widen } from '../catalogue-shape.js';

/** Page text: the collection and animal pages (client/src/features/collection). English first; German must fill the same keys. */
export const collectionEn = {} as const;

export const collectionDe: Widen<typeof collectionEn> = {};

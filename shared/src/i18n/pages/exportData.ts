import type { Widen } from '../catalogue-shape.js';

/** Page text: the data export card (client/src/features/export). English first; German must fill the same keys. */
export const exportDataEn = {} as const;

export const exportDataDe: Widen<typeof exportDataEn> = {};

import type { Widen } from '../catalogue-shape.js';

/** Page text: Today and the dashboard cards (client/src/features/dashboard). English first; German must fill the same keys. */
export const dashboardEn = {} as const;

export const dashboardDe: Widen<typeof dashboardEn> = {};

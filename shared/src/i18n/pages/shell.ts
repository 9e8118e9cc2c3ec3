import type { Widen } from '../catalogue-shape.js';

/** Page text: app shell, navigation, layouts and shared components (client/src/components, client/src/app). English first; German must fill the same keys. */
export const shellEn = {} as const;

export const shellDe: Widen<typeof shellEn> = {};

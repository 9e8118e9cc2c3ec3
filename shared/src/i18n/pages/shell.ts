import type { Widen } from '../catalogue-shape.js';

/** Page text: app shell, navigation, layouts and shared components (client/src/components, client/src/app). English first; German must fill the same keys. */
export const shellEn = {
  loadingMore: 'Loading…',
} as const;

export const shellDe: Widen<typeof shellEn> = {
  loadingMore: 'Wird geladen …',
};

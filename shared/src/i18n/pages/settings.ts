import type { Widen } from '../catalogue-shape.js';

/** Page text: the settings page (client/src/features/settings). English first; German must fill the same keys. */
export const settingsEn = {} as const;

export const settingsDe: Widen<typeof settingsEn> = {};

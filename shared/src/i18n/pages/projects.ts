import type { Widen } from '../catalogue-shape.js';

/** Page text: project pages, pairings, terms, members (client/src/features/projects). English first; German must fill the same keys. */
export const projectsEn = {} as const;

export const projectsDe: Widen<typeof projectsEn> = {};

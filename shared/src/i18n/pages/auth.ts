import type { Widen } from '../catalogue-shape.js';

/** Page text: sign-in, registration, second factor, password reset (client/src/features/auth). English first; German must fill the same keys. */
export const authEn = {} as const;

export const authDe: Widen<typeof authEn> = {};

import type { Widen } from '../catalogue-shape.js';

/** Page text: the inbox (client/src/features/notifications). English first; German must fill the same keys. */
export const notificationsEn = {} as const;

export const notificationsDe: Widen<typeof notificationsEn> = {};

import type { Widen } from '../catalogue-shape.js';

/** Page text: shares, ledger, hand-overs, settlements (client/src/features/account). English first; German must fill the same keys. */
export const accountEn = {
  /** A hand-over waiting for its arrival to be confirmed, said to the one who confirms it (the Today page lists these). */
  todo: {
    handOverMine_one: 'Confirm you received the spiderling handed over to you on {{date}}',
    handOverMine_other: 'Confirm you received the {{count}} spiderlings handed over to you on {{date}}',
    handOverFor_one: 'Confirm that {{party}} received the spiderling handed over on {{date}}',
    handOverFor_other: 'Confirm that {{party}} received the {{count}} spiderlings handed over on {{date}}',
  },
} as const;

export const accountDe: Widen<typeof accountEn> = {
  todo: {
    handOverMine_one: 'Bestätige, dass du das Jungtier erhalten hast, das dir am {{date}} übergeben wurde',
    handOverMine_other: 'Bestätige, dass du die {{count}} Jungtiere erhalten hast, die dir am {{date}} übergeben wurden',
    handOverFor_one: 'Bestätige, dass {{party}} das Jungtier erhalten hat, das am {{date}} übergeben wurde',
    handOverFor_other: 'Bestätige, dass {{party}} die {{count}} Jungtiere erhalten hat, die am {{date}} übergeben wurden',
  },
};

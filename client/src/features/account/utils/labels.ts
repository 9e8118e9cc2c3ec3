import type { EntryStatus } from '@broodsilk/shared';
import { catalogueLabels, i18next, words } from '@/lib/i18n';

export const ENTRY_KIND_LABELS = catalogueLabels('entryKind');
export const METHOD_LABELS = catalogueLabels('handOverMethod');
export const SHIPPING_PAYER_LABELS = catalogueLabels('shippingPayer');

const STATUS_TONES: Record<EntryStatus, string> = {
  'in-force': 'tone-ok',
  reversed: 'tone-failed',
  'awaiting-confirmation': 'tone-due',
  'left-out': 'tone-failed',
};
export const STATUS_LABELS = new Proxy({} as Record<EntryStatus, { label: string; tone: string }>, {
  get: (_t, key: string) => ({ label: words(`entryStatus.${key}`), tone: STATUS_TONES[key as EntryStatus] }),
});

/** "12 spiderlings" / "1 spiderling", in the reader's language. */
export const young = (n: number) => words('page.account.spiderlings', { count: n });

/** A party in a picker with the young still owed to it. */
export const partyOwed = (p: { name: string; owedSpiderlings: number }) => words('page.account.partyOwed', { name: p.name, count: p.owedSpiderlings });

/** A label placed inside a sentence: lower case in English; German keeps its capitals (nouns). */
export function midSentence(label: string): string {
  return i18next.language === 'de' ? label : label.toLowerCase();
}

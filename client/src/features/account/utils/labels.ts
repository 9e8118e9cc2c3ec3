import type { EntryStatus } from '@broodsilk/shared';
import { catalogueLabels, words } from '@/lib/i18n';

export const ENTRY_KIND_LABELS = catalogueLabels('entryKind');
export const METHOD_LABELS = catalogueLabels('handOverMethod');

const STATUS_TONES: Record<EntryStatus, string> = {
  'in-force': 'tone-ok',
  reversed: 'tone-failed',
  'awaiting-confirmation': 'tone-due',
  'left-out': 'tone-failed',
};
export const STATUS_LABELS = new Proxy({} as Record<EntryStatus, { label: string; tone: string }>, {
  get: (_t, key: string) => ({ label: words(`entryStatus.${key}`), tone: STATUS_TONES[key as EntryStatus] }),
});

/** "12 young" / "1 young". */
export const young = (n: number) => `${n} ${n === 1 ? 'spiderling' : 'spiderlings'}`;

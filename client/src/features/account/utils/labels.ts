import type { EntryStatus, HandOverMethod, LedgerEntryResponse } from '@broodsilk/shared';

export const ENTRY_KIND_LABELS: Record<LedgerEntryResponse['kind'], string> = {
  'hand-over': 'Hand-over',
  arrival: 'Arrival count',
  sale: 'Sale',
  'cash-out': 'Cash-out',
  money: 'Payment',
  correction: 'Correction',
  confirmation: 'Payment confirmed',
};

export const METHOD_LABELS: Record<HandOverMethod, string> = { 'pick-up': 'Pick-up', shipment: 'Shipment' };

export const STATUS_LABELS: Record<EntryStatus, { label: string; tone: string }> = {
  'in-force': { label: 'Counts', tone: 'tone-ok' },
  reversed: { label: 'Reversed', tone: 'tone-failed' },
  'awaiting-confirmation': { label: 'Waiting for confirmation', tone: 'tone-due' },
  'left-out': { label: 'Left out', tone: 'tone-failed' },
};

/** "12 young" / "1 young". */
export const young = (n: number) => `${n} ${n === 1 ? 'spiderling' : 'spiderlings'}`;

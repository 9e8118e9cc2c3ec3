import type { CreateAnimalRequest } from '@broodsilk/shared';

/**
 * Columns of the animal CSV, in order. All but the last two are fields of the create request, so
 * an exported file imports as it is; `species` (any catalogue name, former names included) may
 * stand in for `speciesId`, and `lastMoltOn` is written for reading only.
 */
export const CSV_FIELDS = [
  'label',
  'speciesId',
  'sex',
  'maturity',
  'maturedOn',
  'acquiredOn',
  'acquiredFrom',
  'pricePaidMinor',
  'priceCurrency',
  'ownerKind',
  'ownerEmail',
  'ownerName',
  'custody',
  'custodyParty',
  'dueBackOn',
  'status',
  'statusOn',
  'enclosure',
  'notes',
  'premoltNote',
] as const satisfies readonly (keyof CreateAnimalRequest)[];

export const CSV_EXTRA = ['species', 'lastMoltOn'] as const;

export const CSV_COLUMNS = [...CSV_FIELDS.slice(0, 1), 'species', ...CSV_FIELDS.slice(1), 'lastMoltOn'] as const;

/** Most rows a single import takes; larger collections import in parts. */
export const CSV_MAX_ROWS = 5000;
export const CSV_MAX_BYTES = 5 * 1024 * 1024;

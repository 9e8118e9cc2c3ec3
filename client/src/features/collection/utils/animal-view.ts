import {
  ANIMAL_SEXES,
  ANIMAL_SORTS,
  ANIMAL_STATUSES,
  MALE_CLOCK_LABELS,
  type AnimalListQuery,
  type AnimalSex,
  type AnimalSort,
  type AnimalStatus,
  type Custody,
  type ExuviaSex,
  type FemaleReadinessState,
  type MaleClockState,
  type Maturity,
  type OwnerKind,
} from '@broodsilk/shared';
import { MALE_CLOCK_TONE, type ToneStyle } from '@/lib/tones';

export const SEX_LABELS: Record<AnimalSex, string> = { female: 'Female', male: 'Male', unsexed: 'Unsexed' };
export const SEX_SIGNS: Record<AnimalSex, string> = { female: '♀', male: '♂', unsexed: '?' };
export const MATURITY_LABELS: Record<Maturity, string> = { immature: 'Not yet mature', penultimate: 'One molt from mature', mature: 'Mature' };
export const STATUS_LABELS: Record<AnimalStatus, string> = {
  active: 'In the collection',
  'on-loan': 'Lent out',
  returned: 'Returned to owner',
  sold: 'Sold',
  deceased: 'Deceased',
};
export const CUSTODY_LABELS: Record<Custody, string> = { 'with-owner': 'With its owner', 'loan-in': 'On loan to me', 'loan-out': 'On loan out' };
export const OWNER_LABELS: Record<OwnerKind, string> = { self: 'Me', keeper: 'Another keeper here', party: 'Someone outside Broodsilk' };
export const EXUVIA_LABELS: Record<ExuviaSex, string> = { female: 'Female (spermathecae seen)', male: 'Male (no spermathecae)', 'not-sure': 'Could not tell' };

/** Our own words for the male clock; the tone class keeps text contrast in both schemes. */
export const CLOCK_STATES: Record<MaleClockState, { label: string; hint: string } & ToneStyle> = {
  fresh: { ...MALE_CLOCK_LABELS.fresh, ...MALE_CLOCK_TONE.fresh },
  prime: { ...MALE_CLOCK_LABELS.prime, ...MALE_CLOCK_TONE.prime },
  late: { ...MALE_CLOCK_LABELS.late, ...MALE_CLOCK_TONE.late },
  'past-typical': { ...MALE_CLOCK_LABELS['past-typical'], ...MALE_CLOCK_TONE['past-typical'] },
};

export const READINESS_STATES: Record<FemaleReadinessState, { label: string; tone: 'tone-ok' | 'tone-due' | 'tone-failed' }> = {
  'no-molt-recorded': { label: 'No molt on record', tone: 'tone-due' },
  hardening: { label: 'Still hardening', tone: 'tone-due' },
  ready: { label: 'Can be paired', tone: 'tone-ok' },
  premolt: { label: 'Not now, premolt', tone: 'tone-failed' },
};

export const PAGE_SIZES = [25, 50, 100] as const;

export interface CollectionFilters extends Required<Pick<AnimalListQuery, 'limit' | 'offset' | 'sort' | 'order'>> {
  q?: string;
  sex?: AnimalSex;
  status?: AnimalStatus;
  speciesId?: string;
}

/** Whether any filter narrows the list (paging and sorting do not). */
export function hasFilters(f: Pick<CollectionFilters, 'q' | 'sex' | 'status' | 'speciesId'>): boolean {
  return Boolean(f.q || f.sex || f.status || f.speciesId);
}

function oneOf<T extends string>(values: readonly T[], v: string | null): T | undefined {
  return v !== null && (values as readonly string[]).includes(v) ? (v as T) : undefined;
}

function whole(v: string | null, fallback: number, min: number, max: number): number {
  const n = v === null ? NaN : Number(v);
  return Number.isInteger(n) && n >= min && n <= max ? n : fallback;
}

/** The collection's filters live in the URL, so a reload or a shared link keeps them. */
export function filtersFromParams(params: URLSearchParams): CollectionFilters {
  const f: CollectionFilters = {
    limit: whole(params.get('limit'), 25, 1, 500),
    offset: whole(params.get('offset'), 0, 0, Number.MAX_SAFE_INTEGER),
    sort: oneOf<AnimalSort>(ANIMAL_SORTS, params.get('sort')) ?? 'label',
    order: params.get('order') === 'desc' ? 'desc' : 'asc',
  };
  const q = params.get('q')?.trim();
  if (q) f.q = q;
  const sex = oneOf(ANIMAL_SEXES, params.get('sex'));
  if (sex) f.sex = sex;
  const status = oneOf(ANIMAL_STATUSES, params.get('status'));
  if (status) f.status = status;
  const speciesId = params.get('speciesId');
  if (speciesId) f.speciesId = speciesId;
  return f;
}

/** Writes filters back; defaults are left out so links stay short. Other params (the tab) are kept. */
export function filtersToParams(f: Partial<CollectionFilters>, base = new URLSearchParams()): URLSearchParams {
  const p = new URLSearchParams(base);
  for (const k of ['q', 'sex', 'status', 'speciesId', 'sort', 'order', 'limit', 'offset'] as const) p.delete(k);
  if (f.q) p.set('q', f.q);
  if (f.sex) p.set('sex', f.sex);
  if (f.status) p.set('status', f.status);
  if (f.speciesId) p.set('speciesId', f.speciesId);
  if (f.sort && f.sort !== 'label') p.set('sort', f.sort);
  if (f.order === 'desc') p.set('order', 'desc');
  if (f.limit && f.limit !== 25) p.set('limit', String(f.limit));
  if (f.offset) p.set('offset', String(f.offset));
  return p;
}

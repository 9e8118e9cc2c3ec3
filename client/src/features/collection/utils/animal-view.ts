import {
  ANIMAL_SEXES,
  ANIMAL_SORTS,
  ANIMAL_STATUSES,
  type AnimalListQuery,
  type AnimalSex,
  type AnimalSort,
  type AnimalStatus,
  type FemaleReadinessState,
  type MaleClockState,
} from '@broodsilk/shared';
import { MALE_CLOCK_TONE, type ToneStyle } from '@/lib/tones';
import { MALE_CLOCK_LABELS, catalogueLabels, words } from '@/lib/i18n';

export const SEX_LABELS = catalogueLabels('sex');
export const SEX_SIGNS: Record<AnimalSex, string> = { female: '♀', male: '♂', unsexed: '?' };
export const MATURITY_LABELS = catalogueLabels('maturity');
export const STATUS_LABELS = catalogueLabels('animalStatus');
export const CUSTODY_LABELS = catalogueLabels('custody');
export const OWNER_LABELS = catalogueLabels('owner');
export const EXUVIA_LABELS = catalogueLabels('exuvia');

/** The male clock's words (catalogue) with its tone class, which keeps text contrast in both schemes. */
export const CLOCK_STATES = new Proxy({} as Record<MaleClockState, { label: string; hint: string } & ToneStyle>, {
  get: (_t, key: string) => ({ ...MALE_CLOCK_LABELS[key as MaleClockState], ...MALE_CLOCK_TONE[key as MaleClockState] }),
});

const READINESS_TONES: Record<FemaleReadinessState, 'tone-ok' | 'tone-due' | 'tone-failed'> = {
  'no-molt-recorded': 'tone-due',
  hardening: 'tone-due',
  ready: 'tone-ok',
  premolt: 'tone-failed',
};
export const READINESS_STATES = new Proxy({} as Record<FemaleReadinessState, { label: string; tone: 'tone-ok' | 'tone-due' | 'tone-failed' }>, {
  get: (_t, key: string) => ({ label: words(`readiness.${key}`), tone: READINESS_TONES[key as FemaleReadinessState] }),
});

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

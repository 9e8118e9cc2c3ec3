/** The five husbandry groups a species belongs to; group defaults fill a species' missing values. */
export const SPECIES_GROUPS = ['nw-terrestrial', 'nw-arboreal', 'ow-terrestrial', 'ow-arboreal', 'fossorial'] as const;
export type SpeciesGroup = (typeof SPECIES_GROUPS)[number];

/**
 * What is known about a species' bite (our own codes): medically significant bites are published,
 * no such case is known, or nothing is known either way (docs/trade-facts.md §9).
 */
export const VENOM_FLAGS = ['medically-significant', 'no-cases-known', 'not-known'] as const;
export type VenomFlag = (typeof VENOM_FLAGS)[number];

/**
 * Groups whose caution is shown for every species, whatever its own flags: Old World tarantulas
 * (and the burrowers, several of them Old World) have no urticating hairs to warn about, and bites
 * of several Old World genera caused severe cramps (docs/trade-facts.md §9), so a species with no
 * published case is still handled like its group.
 */
export const ALWAYS_CAUTIONED_GROUPS: readonly SpeciesGroup[] = ['ow-terrestrial', 'ow-arboreal', 'fossorial'];

export const groupCautionAlwaysShown = (group: SpeciesGroup): boolean => ALWAYS_CAUTIONED_GROUPS.includes(group);

/**
 * Where a value comes from: a named publication or catalogue, keeper practice
 * with no written source, or recalled by the author of the dataset.
 */
export type ValueSource = (
  { kind: 'published'; citation: string; note?: string } | { kind: 'common-practice'; note?: string } | { kind: 'memory'; note?: string }
) & {
  /** How many observations the figure rests on, where they are few (e.g. 200 eggs a sac from n = 2 sacs). */
  sampleSize?: SampleSize;
};

/** What a figure was counted over: "n = 2 sacs". */
export const SAMPLE_UNITS = ['sacs', 'females', 'bites'] as const;
export type SampleUnit = (typeof SAMPLE_UNITS)[number];
export interface SampleSize {
  count: number;
  unit: SampleUnit;
}

/** Fewer observations than this and a figure is a hint, not a range to check counts against. */
export const FEW_OBSERVATIONS = 10;

/** True when a value rests on only a few observations (it says so beside the figure). */
export const restsOnFew = (source: ValueSource): boolean => source.sampleSize !== undefined && source.sampleSize.count < FEW_OBSERVATIONS;

/** An inclusive whole-number range, e.g. eggs per sac 100–600. */
export interface NumberRange {
  min: number;
  max: number;
}

export interface Sourced<T> {
  value: T;
  source: ValueSource;
}

/** The breeding values of a species: each may be missing, so the group default applies. */
export interface SpeciesBreedingValues {
  /** Days after the lay date in which to pull the sac. */
  pullWindow?: Sourced<{ fromDay: number; toDay: number }>;
  /** Days from pairing to the sac. */
  pairingToSacDays?: Sourced<NumberRange>;
  eggsPerSac?: Sourced<NumberRange>;
  /** Months a male typically lives after his maturing molt. */
  matureMaleLifespanMonths?: Sourced<NumberRange>;
}

/** Days after laying, both ends inclusive. */
export interface DayRange {
  fromDay: number;
  toDay: number;
}

/**
 * When a sac's stages are expected, in days after laying: the species' own figure, else its group's
 * (docs/trade-facts.md §1, §2). A guide for the calendar, never a rule.
 */
export interface ExpectedStageDays {
  /** Prelarvae ("eggs with legs") hatch. */
  eggsWithLegs: Sourced<DayRange> & { from: ValueOrigin };
  /** Free-living young (first instar) leave the sac. */
  freeLiving: Sourced<DayRange> & { from: ValueOrigin };
}

/** The values in force for a species, after falling back to its group and the product default. */
export interface EffectiveBreedingValues {
  pullWindow: Sourced<{ fromDay: number; toDay: number }> & { from: ValueOrigin };
  pairingToSacDays: Sourced<NumberRange> & { from: ValueOrigin };
  eggsPerSac: Sourced<NumberRange> & { from: ValueOrigin };
  matureMaleLifespanMonths: Sourced<NumberRange> & { from: ValueOrigin };
}

/** Whether an effective value is the species' own, its group's, or the product's default. */
export type ValueOrigin = 'species' | 'group' | 'default';

export interface SpeciesCautions {
  urticatingHairs: Sourced<boolean>;
  venom: Sourced<VenomFlag>;
  /** Shown beside the flags; defers to local law and licensed practice. */
  cautionText: string;
}

export interface SpeciesResponse {
  id: string;
  /** Current name as the World Spider Catalog gives it, e.g. "Tliltocatl vagans". */
  scientificName: string;
  genus: string;
  /** Author and year, e.g. "(Ausserer, 1875)". */
  authority: string;
  /** Former names keepers may still use, e.g. "Brachypelma vagans". */
  formerNames: string[];
  commonNames: string[];
  group: SpeciesGroup;
  nameSource: ValueSource;
  cautions: SpeciesCautions;
  /** e.g. "CITES Appendix II"; null when not listed. */
  tradeListing: Sourced<string | null>;
  /** The species' own values only (what an admin edits). */
  breeding: SpeciesBreedingValues;
  /** The values in force: species, else group, else product default. */
  effective: EffectiveBreedingValues;
  updatedAt: string;
}

export interface SpeciesListQuery {
  q?: string;
  group?: SpeciesGroup;
  limit?: number;
  offset?: number;
}

/** What an admin may change; a range value replaces the species' own value and its source. */
export interface UpdateSpeciesRequest {
  commonNames?: string[];
  formerNames?: string[];
  group?: SpeciesGroup;
  urticatingHairs?: boolean;
  venom?: VenomFlag;
  tradeListing?: string | null;
  pullFromDay?: number | null;
  pullToDay?: number | null;
  pairingToSacMinDays?: number | null;
  pairingToSacMaxDays?: number | null;
  eggsMin?: number | null;
  eggsMax?: number | null;
  lifespanMinMonths?: number | null;
  lifespanMaxMonths?: number | null;
  /** Where the values changed in this request come from; a citation is required for `published`. */
  sourceKind?: ValueSource['kind'];
  sourceCitation?: string;
}

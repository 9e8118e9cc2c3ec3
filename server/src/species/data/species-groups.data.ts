import { GROUP_LIFESPAN_DEFAULTS, type DayRange, type NumberRange, type SpeciesGroup, type Sourced } from '@broodsilk/shared';
import { SRC, memo } from './sources';

export interface GroupProfile {
  label: string;
  /** Days from pairing to the sac. For New World terrestrials: the seasonal genera; the tropical ones carry their own (species.data.ts). */
  pairingToSacDays: Sourced<NumberRange>;
  /** Days after laying when prelarvae ("eggs with legs") hatch. */
  eggsWithLegsDays: Sourced<DayRange>;
  /** Days after laying when the free-living young leave the sac. */
  freeLivingDays: Sourced<DayRange>;
  eggsPerSac: Sourced<NumberRange>;
  matureMaleLifespanMonths: Sourced<NumberRange>;
}

/** The product's pull window where a species has none (docs/product.md, Data rules). */
export const DEFAULT_PULL_WINDOW: Sourced<{ fromDay: number; toDay: number }> = {
  value: { fromDay: 21, toDay: 45 },
  source: SRC.common,
};

const lifespan = (g: SpeciesGroup): Sourced<NumberRange> => ({
  value: { min: GROUP_LIFESPAN_DEFAULTS[g].minMonths, max: GROUP_LIFESPAN_DEFAULTS[g].maxMonths },
  source: memo('group default of shared/collection/male-clock.ts'),
});

/** Prelarvae hatch about day 20 in B. smithi, day 25–42 in several genera (docs/trade-facts.md §1, check values 1 and 2). */
const EGGS_WITH_LEGS: Sourced<DayRange> = {
  value: { fromDay: 20, toDay: 42 },
  source: { ...SRC.arachnoworld, note: 'day 25–42 in several genera; from day 20 after brachypelma-smithi.de (B. smithi)' },
};
const days = (fromDay: number, toDay: number, note: string): Sourced<DayRange> => ({ value: { fromDay, toDay }, source: memo(note) });

export const GROUP_PROFILES: Record<SpeciesGroup, GroupProfile> = {
  'nw-terrestrial': {
    label: 'New World terrestrial',
    pairingToSacDays: {
      value: { min: 120, max: 300 },
      source: memo(
        'seasonal genera (Brachypelma, Tliltocatl, Grammostola, Aphonopelma): 4–10 months, paired in autumn, cooled in winter, sac in spring or summer; tropical genera carry their own value',
      ),
    },
    eggsPerSac: { value: { min: 200, max: 800 }, source: SRC.arachnoworld },
    eggsWithLegsDays: EGGS_WITH_LEGS,
    freeLivingDays: days(49, 84, 'young leave the sac 7–12 weeks after laying across the group (7–9 tropical genera, 8–12 seasonal ones)'),
    matureMaleLifespanMonths: lifespan('nw-terrestrial'),
  },
  'nw-arboreal': {
    label: 'New World arboreal',
    pairingToSacDays: { value: { min: 45, max: 120 }, source: memo('about 1.5–4 months') },
    eggsPerSac: { value: { min: 50, max: 200 }, source: memo('Avicularia range') },
    eggsWithLegsDays: EGGS_WITH_LEGS,
    freeLivingDays: days(42, 56, 'Avicularia, Caribena and Psalmopoeus: young leave the sac about 6–8 weeks after laying'),
    matureMaleLifespanMonths: lifespan('nw-arboreal'),
  },
  'ow-terrestrial': {
    label: 'Old World terrestrial',
    pairingToSacDays: { value: { min: 45, max: 120 }, source: memo('about 1.5–4 months') },
    eggsPerSac: { value: { min: 100, max: 300 }, source: memo('Pterinochilus range') },
    eggsWithLegsDays: EGGS_WITH_LEGS,
    freeLivingDays: days(42, 56, 'Pterinochilus about 6–7 weeks; other Old World ground dwellers about as fast'),
    matureMaleLifespanMonths: lifespan('ow-terrestrial'),
  },
  'ow-arboreal': {
    label: 'Old World arboreal',
    pairingToSacDays: { value: { min: 45, max: 120 }, source: memo('about 1.5–4 months') },
    eggsPerSac: { value: { min: 50, max: 150 }, source: memo('Poecilotheria range') },
    eggsWithLegsDays: EGGS_WITH_LEGS,
    freeLivingDays: days(42, 56, 'Poecilotheria: young leave the sac about 6–8 weeks after laying'),
    matureMaleLifespanMonths: lifespan('ow-arboreal'),
  },
  fossorial: {
    label: 'Fossorial (burrowing)',
    // No source about burrowers: the general keeper figure of 4–10 weeks after copulation (spinnen-andre.jimdo.com is not about them).
    pairingToSacDays: {
      value: { min: 28, max: 70 },
      source: { ...SRC.common, note: 'the general figure of 4–10 weeks after copulation; no source about burrowing species was found' },
    },
    eggsPerSac: { value: { min: 100, max: 500 }, source: memo('burrowing genera vary widely') },
    eggsWithLegsDays: EGGS_WITH_LEGS,
    freeLivingDays: {
      value: { fromDay: 42, toDay: 56 },
      source: { ...SRC.common, note: 'a sac left with the mother opens about week 6 (tarantulaspider.net); nothing specific to burrowers' },
    },
    matureMaleLifespanMonths: lifespan('fossorial'),
  },
};

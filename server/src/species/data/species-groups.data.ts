import { GROUP_LIFESPAN_DEFAULTS, type NumberRange, type SpeciesGroup, type Sourced } from '@broodsilk/shared';
import { SRC, memo } from './sources';

export interface GroupProfile {
  label: string;
  pairingToSacDays: Sourced<NumberRange>;
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

export const GROUP_PROFILES: Record<SpeciesGroup, GroupProfile> = {
  'nw-terrestrial': {
    label: 'New World terrestrial',
    pairingToSacDays: { value: { min: 120, max: 300 }, source: memo('4–10 months: paired in autumn, cooled in winter, sac in spring or summer') },
    eggsPerSac: { value: { min: 200, max: 800 }, source: SRC.arachnoworld },
    matureMaleLifespanMonths: lifespan('nw-terrestrial'),
  },
  'nw-arboreal': {
    label: 'New World arboreal',
    pairingToSacDays: { value: { min: 45, max: 120 }, source: memo('about 1.5–4 months') },
    eggsPerSac: { value: { min: 50, max: 200 }, source: memo('Avicularia range') },
    matureMaleLifespanMonths: lifespan('nw-arboreal'),
  },
  'ow-terrestrial': {
    label: 'Old World terrestrial',
    pairingToSacDays: { value: { min: 45, max: 120 }, source: memo('about 1.5–4 months') },
    eggsPerSac: { value: { min: 100, max: 300 }, source: memo('Pterinochilus range') },
    matureMaleLifespanMonths: lifespan('ow-terrestrial'),
  },
  'ow-arboreal': {
    label: 'Old World arboreal',
    pairingToSacDays: { value: { min: 45, max: 120 }, source: memo('about 1.5–4 months') },
    eggsPerSac: { value: { min: 50, max: 150 }, source: memo('Poecilotheria range') },
    matureMaleLifespanMonths: lifespan('ow-arboreal'),
  },
  fossorial: {
    label: 'Fossorial (burrowing)',
    pairingToSacDays: { value: { min: 28, max: 70 }, source: SRC.spinnenAndre },
    eggsPerSac: { value: { min: 100, max: 500 }, source: memo('burrowing genera vary widely') },
    matureMaleLifespanMonths: lifespan('fossorial'),
  },
};

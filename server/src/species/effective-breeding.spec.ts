import { describe, expect, it } from 'vitest';
import { GROUP_LIFESPAN_DEFAULTS } from '@broodsilk/shared';
import { effectiveBreeding, eggsRangeForCheck } from './effective-breeding';
import { GROUP_PROFILES } from './data/species-groups.data';
import { SPECIES_DATA } from './data/species.data';

describe('effectiveBreeding', () => {
  it('a species with no own values gets day 21–45 (common practice) and its group’s values', () => {
    const e = effectiveBreeding('ow-arboreal', {});
    expect(e.pullWindow).toEqual({ value: { fromDay: 21, toDay: 45 }, source: { kind: 'common-practice' }, from: 'default' });
    expect(e.matureMaleLifespanMonths.value).toEqual({
      min: GROUP_LIFESPAN_DEFAULTS['ow-arboreal'].minMonths,
      max: GROUP_LIFESPAN_DEFAULTS['ow-arboreal'].maxMonths,
    });
    expect(e.matureMaleLifespanMonths.from).toBe('group');
    expect(e.eggsPerSac.from).toBe('group');
  });

  it('a species’ own value wins, with its own source', () => {
    const own = { eggsPerSac: { value: { min: 50, max: 200 }, source: { kind: 'published' as const, citation: 'X 2020' } } };
    const e = effectiveBreeding('nw-terrestrial', own);
    expect(e.eggsPerSac).toEqual({ ...own.eggsPerSac, from: 'species' });
    expect(e.pairingToSacDays.from).toBe('group');
  });

  it('a figure from few sacs is a hint: T. vagans, 200 from n = 2 sacs (Dor & Hénaut 2012, docs/trade-facts.md check value 3), is checked with its group range', () => {
    const vagans = SPECIES_DATA.find((r) => r.key === 'tliltocatl-vagans')!;
    expect(vagans.eggsPerSac).toMatchObject({ value: { min: 200, max: 200 }, source: { sampleSize: { count: 2, unit: 'sacs' } } });
    const range = eggsRangeForCheck('nw-terrestrial', { eggsPerSac: vagans.eggsPerSac });
    const group = GROUP_PROFILES['nw-terrestrial'].eggsPerSac.value;
    expect(range).toEqual({ min: Math.min(200, group.min), max: Math.max(200, group.max) });
    // a species range resting on many observations (or none stated) is checked as it is
    const many = { value: { min: 100, max: 600 }, source: { kind: 'published' as const, citation: 'Y', sampleSize: { count: 40, unit: 'sacs' as const } } };
    expect(eggsRangeForCheck('nw-terrestrial', { eggsPerSac: many })).toEqual({ min: 100, max: 600 });
  });
});

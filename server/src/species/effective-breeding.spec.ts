import { describe, expect, it } from 'vitest';
import { GROUP_LIFESPAN_DEFAULTS } from '@broodsilk/shared';
import { effectiveBreeding } from './effective-breeding';

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
});

import { describe, expect, it } from 'vitest';
import { expectedStageDays } from './stage-days';

describe('expectedStageDays', () => {
  it('B. smithi: prelarvae about day 20 (brachypelma-smithi.de after Vachon 1957; docs/trade-facts.md check value 1), young from its genus', () => {
    const d = expectedStageDays({ key: 'brachypelma-smithi', group: 'nw-terrestrial' });
    expect(d.eggsWithLegs).toMatchObject({ value: { fromDay: 20, toDay: 25 }, from: 'species', source: { kind: 'published' } });
    expect(d.freeLiving).toMatchObject({ value: { fromDay: 56, toDay: 84 }, from: 'species', source: { kind: 'memory' } });
  });

  it('a species without figures of its own, or one an admin added, gets its group’s (arachnoworld.de: day 25–42, check value 2)', () => {
    for (const key of ['chilobrachys-fimbriatus', 'not-in-the-dataset']) {
      const d = expectedStageDays({ key, group: 'ow-terrestrial' });
      expect(d.eggsWithLegs).toMatchObject({ value: { fromDay: 20, toDay: 42 }, from: 'group' });
      expect(d.freeLiving).toMatchObject({ value: { fromDay: 42, toDay: 56 }, from: 'group', source: { kind: 'memory' } });
    }
  });

  it('Pterinochilus young leave sooner than the seasonal New World genera (docs/trade-facts.md §2, from memory)', () => {
    const ptero = expectedStageDays({ key: 'pterinochilus-murinus', group: 'ow-terrestrial' }).freeLiving.value;
    const rosea = expectedStageDays({ key: 'grammostola-rosea', group: 'nw-terrestrial' }).freeLiving.value;
    expect(ptero.toDay).toBeLessThan(rosea.fromDay);
  });
});

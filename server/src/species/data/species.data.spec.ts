import { describe, expect, it } from 'vitest';
import { SPECIES_GROUPS, type Sourced, type ValueSource } from '@broodsilk/shared';
import { SPECIES_DATA, SPECIES_DATASET_VERSION, type SpeciesDataRow } from './species.data';
import { DEFAULT_PULL_WINDOW, GROUP_PROFILES } from './species-groups.data';

const byName = new Map(SPECIES_DATA.map((r) => [r.scientificName, r]));
const row = (name: string): SpeciesDataRow => {
  const r = byName.get(name);
  if (!r) throw new Error(`${name} is not in the dataset`);
  return r;
};
const citation = (s: ValueSource): string => (s.kind === 'published' ? s.citation : `(${s.kind})`);

function sourcedValues(r: SpeciesDataRow): [string, Sourced<unknown> | { source: ValueSource }][] {
  const out: [string, Sourced<unknown> | { source: ValueSource }][] = [
    ['name', { source: r.nameSource }],
    ['urticatingHairs', r.urticatingHairs],
    ['venom', r.venom],
    ['tradeListing', r.tradeListing],
  ];
  if (r.pullWindow) out.push(['pullWindow', r.pullWindow]);
  if (r.pairingToSacDays) out.push(['pairingToSacDays', r.pairingToSacDays]);
  if (r.eggsPerSac) out.push(['eggsPerSac', r.eggsPerSac]);
  if (r.matureMaleLifespanMonths) out.push(['lifespan', r.matureMaleLifespanMonths]);
  return out;
}

describe('species dataset', () => {
  it('holds at least 40 species across all five groups', () => {
    expect(SPECIES_DATA.length).toBeGreaterThanOrEqual(40);
    for (const g of SPECIES_GROUPS)
      expect(
        SPECIES_DATA.some((r) => r.group === g),
        g,
      ).toBe(true);
    // New World and Old World both present (docs/product.md, What it does: commonly bred species of both)
    expect(SPECIES_DATA.filter((r) => r.group.startsWith('ow')).length).toBeGreaterThanOrEqual(10);
  });

  it('every row is well formed', () => {
    for (const r of SPECIES_DATA) {
      expect(r.scientificName, r.key).toMatch(/^[A-Z][a-z]+ [a-z]+$/);
      // ICZN style author citation, parentheses when the species left its original genus.
      expect(r.authority, r.key).toMatch(/^\(?[A-Z][^()]*, (17|18|19|20)\d{2}\)?$/);
      expect(r.key).toBe(r.scientificName.toLowerCase().replace(' ', '-'));
      expect(SPECIES_GROUPS).toContain(r.group);
      for (const f of r.formerNames) expect(f, r.key).toMatch(/^[A-Z][a-z]+ [a-z]+$/);
      for (const range of [r.pairingToSacDays, r.eggsPerSac, r.matureMaleLifespanMonths]) {
        if (range) expect(range.value.min, r.key).toBeLessThanOrEqual(range.value.max);
      }
      if (r.pullWindow) expect(r.pullWindow.value.fromDay).toBeLessThan(r.pullWindow.value.toDay);
    }
  });

  it('names are unique, and no former name is another row’s current name', () => {
    const current = SPECIES_DATA.map((r) => r.scientificName);
    expect(new Set(current).size).toBe(current.length);
    const former = SPECIES_DATA.flatMap((r) => r.formerNames);
    expect(new Set(former).size).toBe(former.length);
    for (const f of former) expect(current, f).not.toContain(f);
  });

  it('old names resolve to the current name', () => {
    const resolve = (name: string) => SPECIES_DATA.find((r) => r.scientificName === name || r.formerNames.includes(name))?.scientificName;
    // Mendoza & Francke 2020 (Tliltocatl); synonym chain as in docs/trade-facts.md §8
    expect(resolve('Brachypelma vagans')).toBe('Tliltocatl vagans');
    expect(resolve('Euathlus vagans')).toBe('Tliltocatl vagans');
    expect(resolve('Eurypelma vagans')).toBe('Tliltocatl vagans');
    expect(resolve('Brachypelma albopilosum')).toBe('Tliltocatl albopilosus');
    // Fukushima & Bertani 2017, ZooKeys 659
    expect(resolve('Avicularia versicolor')).toBe('Caribena versicolor');
    // Mendoza & Francke 2017, Invertebrate Systematics 31(2), doi:10.1071/IS16023: a synonym of B. smithi, not B. hamorii
    expect(resolve('Brachypelma annitha')).toBe('Brachypelma smithi');
    // from memory (docs/trade-facts.md §8 marks it so)
    expect(resolve('Citharischius crawshayi')).toBe('Pelinobius muticus');
  });

  it('every value carries a source, and published sources name a publication', () => {
    const tally = { published: 0, 'common-practice': 0, memory: 0 };
    for (const r of SPECIES_DATA) {
      for (const [what, v] of sourcedValues(r)) {
        expect(['published', 'common-practice', 'memory'], `${r.key}.${what}`).toContain(v.source.kind);
        if (v.source.kind === 'published') expect(v.source.citation.length, `${r.key}.${what}`).toBeGreaterThan(10);
        tally[v.source.kind] += 1;
      }
    }
    for (const g of Object.values(GROUP_PROFILES)) {
      for (const v of [g.pairingToSacDays, g.eggsPerSac, g.matureMaleLifespanMonths]) tally[v.source.kind] += 1;
    }
    tally[DEFAULT_PULL_WINDOW.source.kind] += 1;
    console.log('Species catalogue values by source (species rows + group defaults):');
    console.table({ 'named source': tally.published, 'common practice': tally['common-practice'], 'from memory': tally.memory });
    expect(tally.published).toBeGreaterThan(0);
  });

  it('states the World Spider Catalog version and DOI it follows (docs/trade-facts.md §8)', () => {
    expect(SPECIES_DATASET_VERSION).toContain('Version 26');
    expect(SPECIES_DATASET_VERSION).toContain('doi: 10.24436/2');
  });

  describe('values found in docs/trade-facts.md cite the source named there', () => {
    it('Theraphosa blondi: at most 200 eggs (thezooreviewer 2024)', () => {
      const eggs = row('Theraphosa blondi').eggsPerSac!;
      expect(eggs.value.max).toBeLessThanOrEqual(200);
      expect(citation(eggs.source)).toMatch(/thezooreviewer/);
    });
    it('Brachypelma smithi: up to 600 eggs (brachypelma-smithi.de)', () => {
      const eggs = row('Brachypelma smithi').eggsPerSac!;
      expect(eggs.value.max).toBe(600);
      expect(citation(eggs.source)).toMatch(/brachypelma-smithi\.de/);
    });
    it('Lasiodora parahybana: up to 2000 eggs (zoo species page)', () => {
      const eggs = row('Lasiodora parahybana').eggsPerSac!;
      expect(eggs.value.max).toBe(2000);
      expect(citation(eggs.source)).toMatch(/Zoo species page/);
    });
    it('Tliltocatl vagans: 200 young per sac (Dor & Hénaut 2012)', () => {
      const eggs = row('Tliltocatl vagans').eggsPerSac!;
      expect(eggs.value).toEqual({ min: 200, max: 200 });
      expect(citation(eggs.source)).toMatch(/Dor, A\. & Hénaut, Y\. 2012/);
    });
    it('Pelinobius muticus: more than 1000 eggs (tarantulaspider.net)', () => {
      const eggs = row('Pelinobius muticus').eggsPerSac!;
      expect(eggs.value.min).toBeGreaterThanOrEqual(1000);
      expect(citation(eggs.source)).toMatch(/tarantulaspider\.net/);
    });
    it('egg counts stay within 1…2000 per sac across the family (vogelspinnen-seite.de)', () => {
      for (const r of SPECIES_DATA) if (r.eggsPerSac) expect(r.eggsPerSac.value.max, r.key).toBeLessThanOrEqual(2000);
      for (const g of Object.values(GROUP_PROFILES)) expect(g.eggsPerSac.value.max).toBeLessThanOrEqual(2000);
    });
    it('mature-male lifespans never exceed 24 months (Wikipedia life cycle; biologyinsights: 6 months to 2 years)', () => {
      for (const r of SPECIES_DATA) if (r.matureMaleLifespanMonths) expect(r.matureMaleLifespanMonths.value.max, r.key).toBeLessThanOrEqual(24);
    });
    it('Tliltocatl albopilosus males: at most 12 months after maturing (arachnofolies.ch)', () => {
      const life = row('Tliltocatl albopilosus').matureMaleLifespanMonths!;
      expect(life.value.max).toBe(12);
      expect(citation(life.source)).toMatch(/arachnofolies\.ch/);
    });
    it('venom cautions: Poecilotheria (Fuchs et al. 2014), Pterinochilus and Lampropelma (Ahmed, Pinkham & Warrell 2009)', () => {
      for (const r of SPECIES_DATA.filter((x) => x.scientificName.startsWith('Poecilotheria '))) {
        expect(r.venom.value, r.key).toBe('medically-significant');
        expect(citation(r.venom.source)).toMatch(/Fuchs/);
      }
      for (const name of ['Pterinochilus murinus', 'Lampropelma nigerrimum']) {
        expect(row(name).venom.value).toBe('medically-significant');
        expect(citation(row(name).venom.source)).toMatch(/Ahmed, N\., Pinkham, M\. & Warrell/);
      }
      // New World species carry no medically significant venom in this dataset
      expect(SPECIES_DATA.filter((r) => r.group.startsWith('nw') && r.venom.value === 'medically-significant')).toEqual([]);
    });
    it('venom is three-valued: an Old World species without a published bite is "not known", never "no cases known" (Ahmed et al. 2009; Hauke & Herzig 2020)', () => {
      for (const r of SPECIES_DATA.filter((x) => x.group.startsWith('ow'))) expect(r.venom.value, r.key).not.toBe('no-cases-known');
      expect(row('Monocentropus balfouri').venom.value).toBe('not-known');
      expect(row('Chilobrachys fimbriatus').venom.value).toBe('not-known');
      // Old World burrowers too; Psalmopoeus is said to have a stronger venom (HandWiki), so not known either
      for (const name of ['Pelinobius muticus', 'Cyriopagopus lividus', 'Psalmopoeus irminia']) expect(row(name).venom.value, name).toBe('not-known');
      expect(row('Tliltocatl vagans').venom.value).toBe('no-cases-known');
    });
    it('CITES Appendix II for Brachypelma and Tliltocatl (Mendoza & Francke 2020; CEC 2019) and Poecilotheria (CoP18, memory)', () => {
      for (const r of SPECIES_DATA.filter((x) => /^(Brachypelma|Tliltocatl|Poecilotheria) /.test(x.scientificName))) {
        expect(r.tradeListing.value, r.key).toBe('CITES Appendix II');
      }
      expect(citation(row('Tliltocatl vagans').tradeListing.source)).toMatch(/Mendoza, J\. & Francke, O\. 2020/);
      expect(citation(row('Brachypelma smithi').tradeListing.source)).toMatch(/Identification of CITES-listed Tarantulas/);
      expect(row('Poecilotheria regalis').tradeListing.source.kind).toBe('memory');
    });
    it('Grammostola urticating hairs cite the Lancet eye case (Carrim et al. 2010)', () => {
      expect(row('Grammostola rosea').urticatingHairs.value).toBe(true);
      expect(citation(row('Grammostola rosea').urticatingHairs.source)).toMatch(/Carrim/);
    });
    it('pull windows sit inside day 21–45, the common-practice span (docs/trade-facts.md §2)', () => {
      for (const r of SPECIES_DATA) {
        if (!r.pullWindow) continue;
        expect(r.pullWindow.value.fromDay, r.key).toBeGreaterThanOrEqual(21);
        expect(r.pullWindow.value.toDay, r.key).toBeLessThanOrEqual(45);
      }
    });
  });
});

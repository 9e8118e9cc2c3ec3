import type { DayRange, NumberRange, SpeciesGroup, Sourced, ValueSource, VenomFlag } from '@broodsilk/shared';
import { SRC, WSC_VERSION, memo } from './sources';
import { COMMON_NAMES } from './common-names.data';

/**
 * The checked-in species catalogue. Names follow the World Spider Catalog, version 26 (2025),
 * doi 10.24436/2 (see WSC_VERSION); author/year were written down from that catalogue by memory
 * unless a revision is cited. Every value names its source; values left out fall back to the
 * group (species-groups.data.ts) or the product default pull window.
 */
export interface SpeciesDataRow {
  key: string;
  scientificName: string;
  authority: string;
  group: SpeciesGroup;
  formerNames: string[];
  commonNames: string[];
  nameSource: ValueSource;
  urticatingHairs: Sourced<boolean>;
  /** What is known about its bite: three values, never a guess (docs/trade-facts.md §9). */
  venom: Sourced<VenomFlag>;
  tradeListing: Sourced<string | null>;
  pullWindow?: Sourced<{ fromDay: number; toDay: number }>;
  pairingToSacDays?: Sourced<NumberRange>;
  eggsPerSac?: Sourced<NumberRange>;
  matureMaleLifespanMonths?: Sourced<NumberRange>;
  /** Days after laying when prelarvae hatch; the group's figure where missing (species-groups.data.ts). */
  eggsWithLegsDays?: Sourced<DayRange>;
  /** Days after laying when the free-living young leave the sac; the group's figure where missing. */
  freeLivingDays?: Sourced<DayRange>;
}

export const SPECIES_DATASET_VERSION = WSC_VERSION;

type Options = Partial<Omit<SpeciesDataRow, 'key' | 'scientificName' | 'authority' | 'group'>>;

const NAME_FROM_WSC = memo('name and authority as given by World Spider Catalog version 26 (2025)');
const HAIRS_NW = memo('New World theraphosines flick urticating hairs');
const NO_HAIRS_OW = memo('Old World theraphosids have no urticating hairs');
const NO_VENOM_NOTE = memo('no published case of severe systemic effects known to us');
/** Old World species with no published bite account: nobody knows, so the group's caution applies. */
export const OW_NOT_KNOWN_NOTE = 'no published bite account found for this species; several Old World genera caused severe cramps';
const OW_NOT_KNOWN = memo(OW_NOT_KNOWN_NOTE);
const NOT_LISTED = memo('not in the CITES appendices as far as we know');
const CITES_II = 'CITES Appendix II';

/** The catalogue key of a scientific name: lower case, words joined by hyphens. */
export const speciesKey = (scientificName: string): string => scientificName.toLowerCase().replace(/\s+/g, '-');

function sp(scientificName: string, authority: string, group: SpeciesGroup, o: Options = {}): SpeciesDataRow {
  const nw = group.startsWith('nw');
  return {
    key: speciesKey(scientificName),
    scientificName,
    authority,
    group,
    formerNames: o.formerNames ?? [],
    commonNames: o.commonNames ?? COMMON_NAMES[scientificName] ?? [],
    nameSource: o.nameSource ?? NAME_FROM_WSC,
    urticatingHairs: o.urticatingHairs ?? { value: nw, source: nw ? HAIRS_NW : NO_HAIRS_OW },
    venom: o.venom ?? (group.startsWith('ow') ? { value: 'not-known', source: OW_NOT_KNOWN } : { value: 'no-cases-known', source: NO_VENOM_NOTE }),
    tradeListing: o.tradeListing ?? { value: null, source: NOT_LISTED },
    ...(o.pullWindow ? { pullWindow: o.pullWindow } : {}),
    ...(o.pairingToSacDays ? { pairingToSacDays: o.pairingToSacDays } : {}),
    ...(o.eggsPerSac ? { eggsPerSac: o.eggsPerSac } : {}),
    ...(o.matureMaleLifespanMonths ? { matureMaleLifespanMonths: o.matureMaleLifespanMonths } : {}),
    ...(o.eggsWithLegsDays ? { eggsWithLegsDays: o.eggsWithLegsDays } : {}),
    ...(o.freeLivingDays ? { freeLivingDays: o.freeLivingDays } : {}),
  };
}

// Genus pull windows recalled in docs/trade-facts.md §2 (memory, editable defaults).
const pull = (fromDay: number, toDay: number, genus: string): Sourced<{ fromDay: number; toDay: number }> => ({
  value: { fromDay, toDay },
  source: memo(`usual pull days for ${genus}`),
});
/** Dor & Hénaut 2012 counted 200 young in each of two sacs (docs/trade-facts.md §6, check value 3). */
export const TLIL_VAGANS_EGGS_SOURCE: ValueSource = { ...SRC.dorHenaut2012, sampleSize: { count: 2, unit: 'sacs' } };
const range = (min: number, max: number, source: ValueSource): Sourced<NumberRange> => ({ value: { min, max }, source });

// Laying to free-living young, genus figures recalled in docs/trade-facts.md §2 (memory).
const young = (fromDay: number, toDay: number, note: string): Sourced<DayRange> => ({ value: { fromDay, toDay }, source: memo(note) });
const SEASONAL_YOUNG = young(56, 84, 'Brachypelma, Tliltocatl and Grammostola: young leave the sac about 8–12 weeks after laying');
const LARGE_TROPICAL_YOUNG = young(49, 63, 'Lasiodora and Acanthoscurria: young leave the sac about 7–9 weeks after laying');
/**
 * New World ground dwellers from tropical lowlands with no marked cool season: the group's 4–10
 * months (seasonal genera, paired in autumn and cooled over winter) does not fit them (docs/trade-facts.md §3).
 */
const tropical = (o: Options = {}): Options => ({
  pairingToSacDays: range(
    45,
    180,
    memo('tropical New World ground dwellers, no cool season needed: about 1.5–6 months from pairing to sac, like the arboreals'),
  ),
  ...o,
});

const tlil = (o: Options): Options => ({
  nameSource: SRC.mendozaFrancke2020,
  tradeListing: { value: CITES_II, source: SRC.mendozaFrancke2020 },
  pullWindow: pull(30, 45, 'Brachypelma and Tliltocatl'),
  freeLivingDays: SEASONAL_YOUNG,
  ...o,
});
const brachy = (o: Options = {}): Options => ({
  tradeListing: { value: CITES_II, source: SRC.cec2019 },
  pullWindow: pull(30, 45, 'Brachypelma and Tliltocatl'),
  eggsPerSac: range(100, 600, { ...SRC.brachypelmaSmithiDe, note: 'genus range' } as ValueSource),
  freeLivingDays: SEASONAL_YOUNG,
  ...o,
});
const grammo = (o: Options = {}): Options => ({ pullWindow: pull(30, 45, 'Grammostola'), freeLivingDays: SEASONAL_YOUNG, ...o });
const poeci = (o: Options = {}): Options => ({
  venom: { value: 'medically-significant', source: SRC.fuchs2014 },
  tradeListing: { value: CITES_II, source: memo('proposed in CITES CoP18 Prop. 46 (2019); its adoption is recalled, not checked') },
  pullWindow: pull(21, 30, 'Poecilotheria'),
  eggsPerSac: range(50, 150, memo('Poecilotheria range')),
  ...o,
});
const aviculariine = (o: Options = {}): Options => ({ pullWindow: pull(21, 30, 'Avicularia and Caribena'), ...o });
const psalmo = (o: Options = {}): Options => ({
  urticatingHairs: { value: false, source: memo('Psalmopoeus has no urticating hairs') },
  venom: { value: 'not-known', source: SRC.handwikiPsalmopoeus },
  pullWindow: pull(21, 30, 'Psalmopoeus'),
  eggsPerSac: range(80, 200, memo('Psalmopoeus range')),
  ...o,
});
// Bites of harpactirines and stromatopelmines most often caused pronounced cramps (Hauke & Herzig 2020).
const cramps = (source: ValueSource = SRC.haukeHerzig2020): Options => ({ venom: { value: 'medically-significant', source } });
// Old World burrowers in the fossorial group: no published bite account, so not known (the group default is for New World ones).
const owBurrower: Options = { venom: { value: 'not-known', source: OW_NOT_KNOWN } };

export const SPECIES_DATA: SpeciesDataRow[] = [
  // New World terrestrial
  sp(
    'Tliltocatl vagans',
    '(Ausserer, 1875)',
    'nw-terrestrial',
    tlil({
      formerNames: ['Eurypelma vagans', 'Brachypelma vagans', 'Euathlus vagans'],
      // One figure from two lab-reared sacs: shown as "about 200, n = 2 sacs", never as a range.
      eggsPerSac: range(200, 200, TLIL_VAGANS_EGGS_SOURCE),
    }),
  ),
  sp(
    'Tliltocatl albopilosus',
    '(Valerio, 1980)',
    'nw-terrestrial',
    tlil({
      formerNames: ['Brachypelma albopilosum'],
      eggsPerSac: range(300, 1000, memo('Tliltocatl albopilosus range')),
      matureMaleLifespanMonths: range(6, 12, { ...SRC.arachnofolies, note: 'upper bound from the source; lower bound from memory' } as ValueSource),
    }),
  ),
  sp('Tliltocatl kahlenbergi', '(Rudloff, 2008)', 'nw-terrestrial', tlil({ formerNames: ['Brachypelma kahlenbergi'] })),
  sp('Tliltocatl sabulosus', '(F. O. Pickard-Cambridge, 1897)', 'nw-terrestrial', tlil({ formerNames: ['Brachypelma sabulosum'] })),
  sp('Tliltocatl schroederi', '(Rudloff, 2003)', 'nw-terrestrial', tlil({ formerNames: ['Brachypelma schroederi'] })),
  sp('Tliltocatl verdezi', '(Schmidt, 2003)', 'nw-terrestrial', tlil({ formerNames: ['Brachypelma verdezi'] })),
  sp('Tliltocatl epicureanus', '(Chamberlin, 1925)', 'nw-terrestrial', tlil({ formerNames: ['Brachypelma epicureanum'] })),
  sp(
    'Brachypelma smithi',
    '(F. O. Pickard-Cambridge, 1897)',
    'nw-terrestrial',
    brachy({
      // B. annitha is a synonym of B. smithi, not of B. hamorii (Mendoza & Francke 2017, doi:10.1071/IS16023; docs/trade-facts.md §8).
      formerNames: ['Eurypelma smithi', 'Brachypelma annitha'],
      eggsPerSac: range(100, 600, { ...SRC.brachypelmaSmithiDe, note: 'up to 600 for B. smithi; lower bound is the genus range' } as ValueSource),
      // prelarvae about day 20 (brachypelma-smithi.de after Vachon 1957; docs/trade-facts.md check value 1); the span to 25 is ours
      eggsWithLegsDays: { value: { fromDay: 20, toDay: 25 }, source: { ...SRC.brachypelmaSmithiDe, note: 'about day 20; the span to day 25 is ours' } },
    }),
  ),
  sp('Brachypelma hamorii', 'Tesmoingt, Cleton & Verdez, 1997', 'nw-terrestrial', brachy()),
  sp('Brachypelma auratum', 'Schmidt, 1992', 'nw-terrestrial', brachy()),
  sp('Brachypelma boehmei', 'Schmidt & Klaas, 1993', 'nw-terrestrial', brachy()),
  sp('Brachypelma emilia', '(White, 1856)', 'nw-terrestrial', brachy({ formerNames: ['Mygale emilia'] })),
  sp('Brachypelma albiceps', 'Pocock, 1903', 'nw-terrestrial', brachy({ formerNames: ['Brachypelma ruhnaui', 'Aphonopelma albiceps'] })),
  sp('Brachypelma klaasi', '(Schmidt & Krause, 1994)', 'nw-terrestrial', brachy()),
  sp('Brachypelma baumgarteni', 'Smith, 1993', 'nw-terrestrial', brachy()),
  sp(
    'Grammostola rosea',
    '(Walckenaer, 1837)',
    'nw-terrestrial',
    grammo({
      formerNames: ['Mygale rosea', 'Phrixotrichus roseus', 'Grammostola spatulata', 'Grammostola cala'],
      urticatingHairs: { value: true, source: SRC.carrim2010 },
      eggsPerSac: range(80, 1000, SRC.mommajorje2010),
      pairingToSacDays: range(120, 400, memo('G. rosea sometimes lays more than 12 months after pairing')),
    }),
  ),
  sp('Grammostola porteri', '(Mello-Leitão, 1936)', 'nw-terrestrial', grammo()),
  sp(
    'Grammostola pulchripes',
    '(Simon, 1891)',
    'nw-terrestrial',
    grammo({
      formerNames: ['Grammostola aureostriata'],
      eggsPerSac: range(400, 1000, memo('Grammostola pulchripes range')),
    }),
  ),
  sp('Grammostola pulchra', 'Mello-Leitão, 1921', 'nw-terrestrial', grammo()),
  sp(
    'Grammostola mollicoma',
    '(Ausserer, 1875)',
    'nw-terrestrial',
    grammo({
      eggsPerSac: range(150, 250, { ...SRC.arachnoworld, note: 'about 200; the span around it is ours' } as ValueSource),
    }),
  ),
  sp('Lasiodora parahybana', 'Mello-Leitão, 1917', 'nw-terrestrial', {
    ...tropical({ freeLivingDays: LARGE_TROPICAL_YOUNG }),
    pullWindow: pull(25, 35, 'Lasiodora'),
    eggsPerSac: range(1000, 2000, { ...SRC.lasiodoraZoo, note: 'upper bound from the source; lower bound from memory' } as ValueSource),
  }),
  sp('Lasiodora klugi', '(C. L. Koch, 1841)', 'nw-terrestrial', {
    ...tropical({ freeLivingDays: LARGE_TROPICAL_YOUNG }),
    pullWindow: pull(25, 35, 'Lasiodora'),
    eggsPerSac: range(150, 250, { ...SRC.arachnoworld, note: 'about 200; the span around it is ours' } as ValueSource),
  }),
  sp('Acanthoscurria geniculata', '(C. L. Koch, 1841)', 'nw-terrestrial', {
    ...tropical({ freeLivingDays: LARGE_TROPICAL_YOUNG }),
    pullWindow: pull(25, 35, 'Acanthoscurria'),
    eggsPerSac: range(500, 1500, memo('Acanthoscurria geniculata range')),
  }),
  sp('Pamphobeteus antinous', 'Pocock, 1903', 'nw-terrestrial', {
    ...tropical(),
    eggsPerSac: range(700, 900, { ...SRC.arachnoworld, note: 'about 800; the span around it is ours' } as ValueSource),
  }),
  sp('Nhandu chromatus', 'Schmidt, 2004', 'nw-terrestrial', tropical()),
  sp('Aphonopelma chalcodes', 'Chamberlin, 1940', 'nw-terrestrial'),
  sp('Aphonopelma seemanni', '(F. O. Pickard-Cambridge, 1897)', 'nw-terrestrial', tropical()),
  sp('Aphonopelma hentzi', '(Girard, 1852)', 'nw-terrestrial'),
  sp('Chromatopelma cyaneopubescens', '(Strand, 1907)', 'nw-terrestrial', {
    ...tropical(),
    pullWindow: pull(21, 30, 'Chromatopelma'),
    eggsPerSac: range(80, 200, memo('Chromatopelma range')),
  }),
  sp('Theraphosa blondi', '(Latreille, 1804)', 'nw-terrestrial', {
    ...tropical({ freeLivingDays: { value: { fromDay: 42, toDay: 56 }, source: SRC.theraphosaTiming } }),
    pullWindow: pull(21, 30, 'Theraphosa'),
    eggsPerSac: range(50, 200, SRC.theraphosaClutch),
    matureMaleLifespanMonths: range(3, 12, memo('males usually die within a few months of mating')),
  }),
  sp('Theraphosa stirmi', 'Rudloff & Weinmann, 2010', 'nw-terrestrial', tropical({ pullWindow: pull(21, 30, 'Theraphosa') })),
  sp('Eupalaestrus campestratus', '(Simon, 1891)', 'nw-terrestrial'),
  sp('Cyriocosmus elegans', '(Simon, 1889)', 'nw-terrestrial', { ...tropical(), matureMaleLifespanMonths: range(4, 10, memo('dwarf species live shorter')) }),
  sp('Davus pentaloris', '(Simon, 1888)', 'nw-terrestrial', tropical()),
  sp('Xenesthis immanis', '(Ausserer, 1875)', 'nw-terrestrial', tropical()),
  sp('Phormictopus cancerides', '(Latreille, 1806)', 'nw-terrestrial', tropical()),

  // New World arboreal
  sp(
    'Caribena versicolor',
    '(Walckenaer, 1837)',
    'nw-arboreal',
    aviculariine({
      formerNames: ['Avicularia versicolor', 'Mygale versicolor'],
      nameSource: SRC.fukushimaBertani2017,
      eggsPerSac: range(50, 150, memo('Caribena versicolor range')),
    }),
  ),
  sp('Caribena laeta', '(C. L. Koch, 1842)', 'nw-arboreal', aviculariine({ formerNames: ['Avicularia laeta'], nameSource: SRC.fukushimaBertani2017 })),
  sp('Avicularia avicularia', '(Linnaeus, 1758)', 'nw-arboreal', aviculariine({ formerNames: ['Aranea avicularia', 'Avicularia metallica'] })),
  sp('Avicularia purpurea', 'Kirk, 1990', 'nw-arboreal', aviculariine()),
  sp(
    'Ybyrapora diversipes',
    '(C. L. Koch, 1842)',
    'nw-arboreal',
    aviculariine({ formerNames: ['Avicularia diversipes'], nameSource: SRC.fukushimaBertani2017 }),
  ),
  sp(
    'Psalmopoeus irminia',
    'Saager, 1994',
    'nw-arboreal',
    psalmo({
      matureMaleLifespanMonths: range(2, 6, memo('German Wikipedia: males live only weeks to months after maturing')),
    }),
  ),
  sp('Psalmopoeus cambridgei', 'Pocock, 1895', 'nw-arboreal', psalmo()),

  // Old World terrestrial
  sp('Pterinochilus murinus', 'Pocock, 1897', 'ow-terrestrial', {
    ...cramps(SRC.ahmed2009),
    pullWindow: pull(21, 28, 'Pterinochilus'),
    freeLivingDays: young(42, 49, 'Pterinochilus: young leave the sac about 6–7 weeks after laying'),
    eggsPerSac: range(100, 300, memo('Pterinochilus range')),
  }),
  sp('Ceratogyrus darlingi', 'Pocock, 1897', 'ow-terrestrial', cramps()),
  sp('Harpactira pulchripes', 'Pocock, 1901', 'ow-terrestrial', cramps()),
  sp('Monocentropus balfouri', '(Pocock, 1897)', 'ow-terrestrial'),
  sp('Chilobrachys fimbriatus', 'Pocock, 1899', 'ow-terrestrial'),

  // Old World arboreal
  sp('Poecilotheria regalis', 'Pocock, 1899', 'ow-arboreal', poeci()),
  sp('Poecilotheria metallica', 'Pocock, 1899', 'ow-arboreal', poeci()),
  sp('Poecilotheria ornata', 'Pocock, 1899', 'ow-arboreal', poeci()),
  sp('Poecilotheria fasciata', '(Latreille, 1804)', 'ow-arboreal', poeci()),
  sp('Poecilotheria rufilata', 'Pocock, 1899', 'ow-arboreal', poeci()),
  sp('Poecilotheria subfusca', 'Pocock, 1895', 'ow-arboreal', poeci()),
  sp('Lampropelma nigerrimum', 'Simon, 1892', 'ow-arboreal', cramps(SRC.ahmed2009)),
  sp('Omothymus schioedtei', '(Thorell, 1891)', 'ow-arboreal', { formerNames: ['Lampropelma schioedtei'] }),
  sp('Heteroscodra maculata', 'Pocock, 1900', 'ow-arboreal', cramps()),
  sp('Stromatopelma calceatum', '(Fabricius, 1793)', 'ow-arboreal', cramps()),

  // Fossorial
  sp('Pelinobius muticus', 'Karsch, 1885', 'fossorial', {
    ...owBurrower,
    formerNames: ['Citharischius crawshayi'],
    eggsPerSac: range(1000, 2000, {
      ...SRC.tarantulaspiderNet,
      note: 'more than 1000 per the source; 2000 is the family-wide maximum (vogelspinnen-seite.de)',
    } as ValueSource),
  }),
  sp('Cyriopagopus lividus', '(Smith, 1996)', 'fossorial', { ...owBurrower, formerNames: ['Haplopelma lividum'] }),
  sp('Idiothele mira', 'Gallon, 2010', 'fossorial', cramps()),
  sp('Ephebopus murinus', '(Walckenaer, 1837)', 'fossorial', {
    urticatingHairs: { value: true, source: memo('Ephebopus carries urticating hairs on the palps') },
  }),
  sp('Ephebopus cyanognathus', 'West & Marshall, 2000', 'fossorial', {
    urticatingHairs: { value: true, source: memo('Ephebopus carries urticating hairs on the palps') },
  }),
];

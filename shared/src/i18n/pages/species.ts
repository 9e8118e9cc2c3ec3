import type { Widen } from '../catalogue-shape.js';

/** Page text: species pages (client/src/features/species). English first; German must fill the same keys. */
export const speciesEn = {
  /** The species route (client/src/app/routes/species.tsx). */
  page: {
    title: 'Species',
    description: 'The catalogue behind every animal and project: names old and new, safety flags, and the breeding values in force with where each comes from.',
  },
  group: {
    'nw-terrestrial': 'New World, ground-dwelling',
    'nw-arboreal': 'New World, tree-dwelling',
    'ow-terrestrial': 'Old World, ground-dwelling',
    'ow-arboreal': 'Old World, tree-dwelling',
    fossorial: 'Burrowing',
  },
  /** Where a value in force comes from (species, group, product default). */
  origin: { species: 'this species', group: 'group default', default: 'Broodsilk default' },
  sourceInBrackets: '(Source: {{source}})',
  formerly: 'formerly',
  badge: { hairs: 'urticating hairs', venom: 'strong venom', venomNotKnown: 'venom not known' },
  value: {
    pullWindow: 'Pull window',
    pullDays: 'day {{from}}–{{to}}',
    pairingToSac: 'Pairing → sac',
    days: '{{range}} days',
    eggsPerSac: 'Eggs per sac',
    lifespan: 'Male lifespan after maturing',
    months: '{{range}} months',
    /** A figure resting on few observations says so (docs/trade-facts.md §6). */
    aboutSample: 'about {{value}}, n = {{count}} {{unit}}',
    sampleUnit: { sacs_one: 'sac', sacs_other: 'sacs', females_one: 'female', females_other: 'females', bites_one: 'bite', bites_other: 'bites' },
  },
  catalogue: {
    search: 'Search names',
    searchHint: 'Current, former or common name',
    group: 'Group',
    allGroups: 'All groups',
    loading: 'Loading the catalogue…',
    count_one: '{{count}} species',
    count_other: '{{count}} species',
  },
  picker: {
    label: 'Species',
    placeholder: 'Type a current or former name',
    tooShort: 'Type at least two letters',
    searching: 'Searching…',
    nothing: 'No species by that name in the catalogue',
  },
  caution: {
    title: 'Take care: {{what}}',
    whatHairs: 'urticating hairs',
    whatVenom: 'medically significant venom',
    whatVenomNotKnown: 'venom not known',
    whatListing: 'protected-trade listing',
    whatGroup: 'its group',
    hairsHead: 'Urticating hairs.',
    hairs: 'Wear eye protection when working in the enclosure, do not rub your eyes, and wash your hands afterwards. Hairs in an eye need a doctor.',
    venomHead: 'Medically significant venom.',
    venom:
      'A bite can bring severe pain and muscle cramps lasting days. Work with tools rather than hands, keep the enclosure escape-proof, and seek medical help after a bite.',
    venomNotKnownHead: 'Venom not known.',
    listing: 'Selling, lending, shipping or breeding this species may need papers or permits; the rules of your country decide.',
    venomFlag: 'Bites: {{flag}}',
    aboutGroup: 'About its group:',
    law: 'Follow the law where you live and licensed practice: where keeping, breeding, lending or shipping this species is regulated, those rules come before anything shown here.',
  },
} as const;

export const speciesDe: Widen<typeof speciesEn> = {
  page: {
    title: 'Arten',
    description:
      'Der Katalog hinter jedem Tier und jedem Projekt: alte und neue Namen, Sicherheitshinweise und die geltenden Zuchtwerte mit ihrer jeweiligen Herkunft.',
  },
  group: {
    'nw-terrestrial': 'Neuwelt, bodenbewohnend',
    'nw-arboreal': 'Neuwelt, baumbewohnend',
    'ow-terrestrial': 'Altwelt, bodenbewohnend',
    'ow-arboreal': 'Altwelt, baumbewohnend',
    fossorial: 'Grabend',
  },
  origin: { species: 'diese Art', group: 'Vorgabe der Gruppe', default: 'Vorgabe von Broodsilk' },
  sourceInBrackets: '(Quelle: {{source}})',
  formerly: 'früher',
  badge: { hairs: 'Brennhaare', venom: 'starkes Gift', venomNotKnown: 'Gift nicht bekannt' },
  value: {
    pullWindow: 'Zeitfenster zum Entnehmen',
    pullDays: 'Tag {{from}}–{{to}}',
    pairingToSac: 'Verpaarung → Kokon',
    days: '{{range}} Tage',
    eggsPerSac: 'Eier je Kokon',
    lifespan: 'Lebenszeit des Männchens nach der Reifehäutung',
    months: '{{range}} Monate',
    aboutSample: 'etwa {{value}}, n = {{count}} {{unit}}',
    sampleUnit: { sacs_one: 'Kokon', sacs_other: 'Kokons', females_one: 'Weibchen', females_other: 'Weibchen', bites_one: 'Biss', bites_other: 'Bisse' },
  },
  catalogue: {
    search: 'Namen suchen',
    searchHint: 'Heutiger, früherer oder gebräuchlicher Name',
    group: 'Gruppe',
    allGroups: 'Alle Gruppen',
    loading: 'Der Katalog wird geladen …',
    count_one: '{{count}} Art',
    count_other: '{{count}} Arten',
  },
  picker: {
    label: 'Art',
    placeholder: 'Heutigen oder früheren Namen eingeben',
    tooShort: 'Mindestens zwei Buchstaben eingeben',
    searching: 'Suche läuft …',
    nothing: 'Keine Art dieses Namens im Katalog',
  },
  caution: {
    title: 'Vorsicht: {{what}}',
    whatHairs: 'Brennhaare',
    whatVenom: 'medizinisch bedeutsames Gift',
    whatVenomNotKnown: 'Gift nicht bekannt',
    whatListing: 'geschützt im Handel',
    whatGroup: 'ihre Gruppe',
    hairsHead: 'Brennhaare.',
    hairs: 'Trage bei Arbeiten im Terrarium eine Schutzbrille, reibe dir nicht die Augen und wasche danach die Hände. Haare im Auge gehören zum Arzt.',
    venomHead: 'Medizinisch bedeutsames Gift.',
    venom:
      'Ein Biss kann starke Schmerzen und tagelange Muskelkrämpfe auslösen. Arbeite mit Werkzeug statt mit den Händen, halte das Terrarium ausbruchsicher und such nach einem Biss ärztliche Hilfe.',
    venomNotKnownHead: 'Gift nicht bekannt.',
    listing: 'Verkauf, Leihe, Versand oder Zucht dieser Art können Papiere oder Genehmigungen erfordern; maßgeblich sind die Regeln deines Landes.',
    venomFlag: 'Bisse: {{flag}}',
    aboutGroup: 'Zu ihrer Gruppe:',
    law: 'Halte dich an das Recht deines Wohnorts und an fachkundige Praxis: Wo Haltung, Zucht, Leihe oder Versand dieser Art geregelt sind, gehen diese Regeln allem vor, was hier steht.',
  },
};

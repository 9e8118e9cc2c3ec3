import { addDays, todayIn, type AnimalSex, type AnimalStatus, type ExuviaSex } from '@broodsilk/shared';
import type { EntityManager } from '@mikro-orm/postgresql';
import { Animal } from '../animals/animal.entity';
import { Molt } from '../animals/molt.entity';
import { Species } from '../species/species.entity';
import type { User } from '../users/user.entity';
import type { FeatureSeeder } from './demo-seed';

/** One invented animal; day offsets count back from the scenario's today. */
interface DemoAnimal {
  label: string;
  species: string;
  sex: AnimalSex;
  /** Days ago of the maturing molt (males) or of reaching maturity (females: any number marks her mature). */
  maturedDaysAgo?: number;
  acquiredDaysAgo?: number;
  from?: string;
  price?: [number, string];
  enclosure?: string;
  status?: AnimalStatus;
  statusDaysAgo?: number;
  /** Molts, days ago, with the exuvia result. */
  molts?: [number, ExuviaSex | null, number?][];
  premoltNote?: string;
  notes?: string;
}

// Mira's breeding room: females of several groups, males at every point of the clock, a few gone.
const MIRA: DemoAnimal[] = [
  {
    label: 'MO-001',
    species: 'Tliltocatl vagans',
    sex: 'female',
    maturedDaysAgo: 900,
    acquiredDaysAgo: 1400,
    from: 'Spring expo stall 14',
    price: [3500, 'EUR'],
    enclosure: 'Rack A1',
    molts: [
      [260, 'female', 13.5],
      [620, 'female', 12.5],
    ],
  },
  {
    label: 'MO-002',
    species: 'Tliltocatl vagans',
    sex: 'female',
    maturedDaysAgo: 700,
    acquiredDaysAgo: 1200,
    enclosure: 'Rack A2',
    molts: [[30, 'female', 14]],
  },
  {
    label: 'MO-003',
    species: 'Tliltocatl albopilosus',
    sex: 'female',
    maturedDaysAgo: 800,
    acquiredDaysAgo: 1500,
    enclosure: 'Rack A3',
    molts: [[190, 'female', 13]],
    premoltNote: 'Refused two feedings, abdomen darkening',
  },
  {
    label: 'MO-004',
    species: 'Brachypelma hamorii',
    sex: 'female',
    maturedDaysAgo: 1000,
    acquiredDaysAgo: 1700,
    price: [9000, 'EUR'],
    enclosure: 'Rack A4',
    molts: [[330, 'female', 14.5]],
  },
  {
    label: 'MO-005',
    species: 'Grammostola pulchripes',
    sex: 'female',
    maturedDaysAgo: 1100,
    acquiredDaysAgo: 2000,
    enclosure: 'Rack B1',
    molts: [[400, 'female', 17]],
  },
  {
    label: 'MO-006',
    species: 'Caribena versicolor',
    sex: 'female',
    maturedDaysAgo: 300,
    acquiredDaysAgo: 700,
    enclosure: 'Tall 1',
    molts: [[120, 'female', 11]],
  },
  {
    label: 'MO-007',
    species: 'Poecilotheria regalis',
    sex: 'female',
    maturedDaysAgo: 500,
    acquiredDaysAgo: 900,
    price: [6000, 'EUR'],
    enclosure: 'Tall 2',
    molts: [[85, 'female', 16]],
  },
  {
    label: 'MO-008',
    species: 'Poecilotheria metallica',
    sex: 'female',
    maturedDaysAgo: 420,
    acquiredDaysAgo: 800,
    enclosure: 'Tall 3',
    molts: [[12, 'female', 14]],
    notes: 'Molted recently: hold pairing until she hardens.',
  },
  {
    label: 'MO-009',
    species: 'Pterinochilus murinus',
    sex: 'female',
    maturedDaysAgo: 380,
    acquiredDaysAgo: 600,
    enclosure: 'Rack C1',
    molts: [[150, 'female', 10.5]],
  },
  {
    label: 'MO-010',
    species: 'Chromatopelma cyaneopubescens',
    sex: 'female',
    maturedDaysAgo: 350,
    acquiredDaysAgo: 650,
    enclosure: 'Rack C2',
    molts: [[95, 'female', 12]],
  },
  {
    label: 'MO-011',
    species: 'Lasiodora parahybana',
    sex: 'female',
    maturedDaysAgo: 640,
    acquiredDaysAgo: 1300,
    enclosure: 'Floor 1',
    molts: [[210, 'female', 20]],
  },
  {
    label: 'MO-012',
    species: 'Psalmopoeus irminia',
    sex: 'female',
    maturedDaysAgo: 260,
    acquiredDaysAgo: 500,
    enclosure: 'Tall 4',
    molts: [[70, 'female', 12.5]],
  },
  // Males across the clock (Poecilotheria and Pterinochilus run on the Old World lifespan of 4–12 months).
  { label: 'MO-013', species: 'Poecilotheria regalis', sex: 'male', maturedDaysAgo: 9, acquiredDaysAgo: 300, enclosure: 'Tall 5', molts: [[9, 'male', 14]] },
  { label: 'MO-014', species: 'Pterinochilus murinus', sex: 'male', maturedDaysAgo: 55, acquiredDaysAgo: 250, enclosure: 'Rack C3', molts: [[55, 'male', 9]] },
  { label: 'MO-015', species: 'Tliltocatl vagans', sex: 'male', maturedDaysAgo: 150, acquiredDaysAgo: 600, enclosure: 'Rack A5', molts: [[150, 'male', 11.5]] },
  {
    label: 'MO-016',
    species: 'Poecilotheria metallica',
    sex: 'male',
    maturedDaysAgo: 200,
    acquiredDaysAgo: 420,
    enclosure: 'Tall 6',
    molts: [[200, 'male', 13]],
  },
  {
    label: 'MO-017',
    species: 'Caribena versicolor',
    sex: 'male',
    maturedDaysAgo: 410,
    acquiredDaysAgo: 700,
    enclosure: 'Tall 7',
    molts: [[410, 'male', 10]],
    notes: 'Past his typical span; still building sperm webs.',
  },
  {
    label: 'MO-018',
    species: 'Grammostola pulchripes',
    sex: 'male',
    maturedDaysAgo: 30,
    acquiredDaysAgo: 900,
    enclosure: 'Rack B2',
    molts: [[30, 'male', 14]],
  },
  // Young stock
  { label: 'MO-019', species: 'Tliltocatl vagans', sex: 'unsexed', acquiredDaysAgo: 120, enclosure: 'Sling tub 1' },
  { label: 'MO-020', species: 'Tliltocatl vagans', sex: 'unsexed', acquiredDaysAgo: 120, enclosure: 'Sling tub 2' },
  { label: 'MO-021', species: 'Poecilotheria regalis', sex: 'female', acquiredDaysAgo: 300, enclosure: 'Juvenile 1', molts: [[60, 'female', 6]] },
  {
    label: 'MO-022',
    species: 'Pelinobius muticus',
    sex: 'female',
    acquiredDaysAgo: 500,
    enclosure: 'Deep 1',
    price: [4000, 'EUR'],
    molts: [[140, 'not-sure', 9]],
  },
  { label: 'MO-023', species: 'Monocentropus balfouri', sex: 'unsexed', acquiredDaysAgo: 200, enclosure: 'Juvenile 2' },
  { label: 'MO-024', species: 'Ephebopus cyanognathus', sex: 'male', acquiredDaysAgo: 260, enclosure: 'Deep 2', molts: [[45, 'male', 5]] },
  { label: 'MO-025', species: 'Theraphosa stirmi', sex: 'female', acquiredDaysAgo: 400, enclosure: 'Floor 2', molts: [[100, 'female', 12]] },
  // History: sold and deceased stay on record
  {
    label: 'MO-026',
    species: 'Brachypelma hamorii',
    sex: 'male',
    maturedDaysAgo: 500,
    acquiredDaysAgo: 1100,
    status: 'deceased',
    statusDaysAgo: 60,
    enclosure: 'Rack A6',
  },
  {
    label: 'MO-027',
    species: 'Tliltocatl vagans',
    sex: 'female',
    acquiredDaysAgo: 800,
    status: 'sold',
    statusDaysAgo: 200,
    notes: 'Sold to a visitor at the autumn meet.',
  },
  { label: 'MO-028', species: 'Caribena versicolor', sex: 'male', maturedDaysAgo: 420, acquiredDaysAgo: 800, status: 'deceased', statusDaysAgo: 30 },
  { label: 'MO-029', species: 'Psalmopoeus cambridgei', sex: 'unsexed', acquiredDaysAgo: 400, status: 'sold', statusDaysAgo: 90 },
];

const TOMASZ: DemoAnimal[] = [
  {
    label: 'TW-101',
    species: 'Tliltocatl vagans',
    sex: 'female',
    maturedDaysAgo: 600,
    acquiredDaysAgo: 1000,
    enclosure: 'Shelf 1',
    molts: [[170, 'female', 13]],
  },
  {
    label: 'TW-102',
    species: 'Poecilotheria regalis',
    sex: 'female',
    maturedDaysAgo: 400,
    acquiredDaysAgo: 800,
    enclosure: 'Shelf 2',
    molts: [[110, 'female', 15]],
  },
  {
    label: 'TW-103',
    species: 'Lasiodora parahybana',
    sex: 'male',
    maturedDaysAgo: 120,
    acquiredDaysAgo: 700,
    enclosure: 'Shelf 3',
    molts: [[120, 'male', 17]],
  },
  { label: 'TW-104', species: 'Grammostola pulchripes', sex: 'unsexed', acquiredDaysAgo: 90, enclosure: 'Shelf 4' },
];

async function plant(em: EntityManager, keeper: User, today: string, rows: DemoAnimal[], species: Map<string, Species>): Promise<void> {
  for (const r of rows) {
    const mature = r.maturedDaysAgo !== undefined;
    const molts = r.molts ?? [];
    const animal = em.create(Animal, {
      recordedBy: keeper,
      ownerUser: keeper,
      species: species.get(r.species)!,
      label: r.label,
      sex: r.sex,
      maturity: mature ? 'mature' : 'immature',
      maturedOn: mature && r.sex === 'male' ? addDays(today, -r.maturedDaysAgo!) : null,
      acquiredOn: r.acquiredDaysAgo !== undefined ? addDays(today, -r.acquiredDaysAgo) : null,
      acquiredFrom: r.from ?? null,
      pricePaidMinor: r.price?.[0] ?? null,
      priceCurrency: r.price?.[1] ?? null,
      enclosure: r.enclosure ?? null,
      status: r.status ?? 'active',
      statusOn: r.statusDaysAgo !== undefined ? addDays(today, -r.statusDaysAgo) : null,
      premoltNote: r.premoltNote ?? null,
      notes: r.notes ?? null,
      lastMoltOn: molts.length ? addDays(today, -Math.min(...molts.map((m) => m[0]))) : null,
    });
    for (const [daysAgo, exuviaSex, size] of molts) {
      em.create(Molt, {
        animal,
        moltedOn: addDays(today, -daysAgo),
        exuviaSex,
        sizeCm: size?.toFixed(1) ?? null,
        maturing: r.sex === 'male' && daysAgo === r.maturedDaysAgo,
      });
    }
  }
}

/** The collections of the demo: Mira's breeding room, Tomasz's few animals, and Tomasz's male on loan to Mira. */
export const seedCollection: FeatureSeeder = async ({ em, users, today: now }) => {
  const all = await em.find(Species, {});
  const species = new Map(all.map((s) => [s.scientificName, s]));
  const mira = users.keeper;
  const tomasz = users.partner;
  const miraToday = todayIn(mira.timeZone, now);
  await plant(em, mira, miraToday, MIRA, species);
  await plant(em, tomasz, todayIn(tomasz.timeZone, now), TOMASZ, species);

  // Tomasz's mature male, held by Mira for a pairing with MO-007 and due back after it.
  em.create(Animal, {
    recordedBy: mira,
    species: species.get('Poecilotheria regalis')!,
    label: 'MO-030',
    sex: 'male',
    maturity: 'mature',
    maturedOn: addDays(miraToday, -75),
    acquiredOn: addDays(miraToday, -14),
    acquiredFrom: tomasz.displayName,
    ownerKind: 'keeper',
    ownerUser: tomasz,
    ownerEmail: tomasz.email,
    custody: 'loan-in',
    custodyParty: tomasz.displayName,
    dueBackOn: addDays(miraToday, 45),
    enclosure: 'Tall 8',
    notes: 'Breeding loan from Tomasz; goes back after the pairing with MO-007.',
  });
};

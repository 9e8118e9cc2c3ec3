import { screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import type { ProjectAnimal } from '@broodsilk/shared';
import { i18next } from '@/lib/i18n';
import { formatDate } from '@/lib/dates';
import { animalSummary } from '@/testing/animal-summary';
import { renderWithProviders } from '@/testing/render';
import { ProjectAnimals } from './project-animals';

const female: ProjectAnimal = { ...animalSummary({ id: 'f', label: 'MO-007' }), owner: { name: 'Mira' }, dueBackOn: null, maleClock: null, readiness: null };
const male: ProjectAnimal = {
  ...animalSummary({ id: 'm', label: 'MO-030', sex: 'male', custody: 'loan-in', dueBackOn: '2027-03-14' }),
  owner: { name: 'Tomasz' },
  dueBackOn: '2027-03-14',
  maleClock: {
    daysSinceMaturing: 40,
    state: 'prime',
    changes: [],
    daysUntilPastTypical: 300,
    maturedOn: '2026-10-01',
    lifespanMonths: { min: 10, max: 14, from: 'group' },
  },
  readiness: null,
};

describe('ProjectAnimals', () => {
  afterEach(async () => {
    await i18next.changeLanguage('en');
  });

  it('says who owns a loaned male, when he is due back and where his clock stands, in whole sentences', () => {
    renderWithProviders(<ProjectAnimals female={female} males={[male]} />);
    const cards = screen.getByTestId('project-animals');
    expect(cards).toHaveTextContent('Owner: Mira');
    expect(cards).toHaveTextContent(`Owner: Tomasz · on a breeding loan · due back ${formatDate('2027-03-14')}`);
    // the state's label inside an English sentence is lower-cased (catalogue maleClock.prime: "Ready to pair")
    expect(cards).toHaveTextContent('Male clock: day 40 since maturing, ready to pair');
  });

  it('speaks German to a German reader, nouns keeping their capitals', async () => {
    await i18next.changeLanguage('de');
    renderWithProviders(<ProjectAnimals female={female} males={[male, { ...male, id: 'm2', label: 'MO-031' }]} />);
    const cards = screen.getByTestId('project-animals');
    expect(cards).toHaveTextContent('Weibchen');
    expect(cards).toHaveTextContent('Ersatzmännchen');
    expect(cards).toHaveTextContent('Eigentümer: Tomasz · als Zuchtleihgabe · Rückgabe fällig am');
    expect(cards).toHaveTextContent('Uhr des Männchens: Tag 40 seit der Reifehäutung, Bereit zur Verpaarung');
  });
});

import { screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { i18next } from '@/lib/i18n';
import { renderWithProviders } from '@/testing/render';
import { AnimalTable } from './animal-table';
import { animalSummary } from '@/testing/animal-summary';

const props = { items: [], sort: 'label' as const, order: 'asc' as const, onSort: () => undefined, hrefOf: (id: string) => `/collection/${id}` };

describe('AnimalTable when empty', () => {
  it('says plainly that the collection is empty when nothing filters it', () => {
    renderWithProviders(<AnimalTable {...props} filtered={false} />);
    expect(screen.getByText(/Your collection is empty/)).toBeInTheDocument();
    expect(screen.queryByText(/match these filters/)).not.toBeInTheDocument();
  });

  it('blames the filters only when filters are set', () => {
    renderWithProviders(<AnimalTable {...props} filtered />);
    expect(screen.getByText('No animals match these filters.')).toBeInTheDocument();
  });
});

describe('AnimalTable with an animal held by another keeper', () => {
  it('shows the owner her male as on loan to the keeper, read-only', () => {
    const male = animalSummary({ id: 'm1', label: 'MO-030', sex: 'male', custody: 'loan-in', heldBy: { id: 'u1', name: 'Mira Okonkwo' } });
    renderWithProviders(<AnimalTable {...props} items={[male]} filtered={false} />);
    expect(screen.getByTestId('held-by')).toHaveTextContent('On loan to Mira Okonkworead-only');
  });
});

describe('AnimalTable in German', () => {
  afterEach(async () => {
    await i18next.changeLanguage('en');
  });

  it('names its columns, sort buttons and loan in German', async () => {
    await i18next.changeLanguage('de');
    const male = animalSummary({ id: 'm1', label: 'MO-030', sex: 'male', custody: 'loan-in', heldBy: { id: 'u1', name: 'Mira Okonkwo' } });
    renderWithProviders(<AnimalTable {...props} items={[male]} filtered={false} />);
    expect(screen.getByRole('table', { name: 'Tiere' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Nach Bezeichnung sortieren' })).toBeInTheDocument();
    expect(screen.getByRole('columnheader', { name: 'Letzte Häutung' })).toBeInTheDocument();
    expect(screen.getByTestId('held-by')).toHaveTextContent('Verliehen an Mira Okonkwoschreibgeschützt');
  });
});

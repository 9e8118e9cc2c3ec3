import { screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { i18next } from '@/lib/i18n';
import { renderWithProviders } from '@/testing/render';
import { CollectionDescription } from './collection';

afterEach(async () => {
  await i18next.changeLanguage('en');
});

describe('the collection page description', () => {
  it('is one sentence whose word "catalogue" opens the species pages', () => {
    renderWithProviders(
      <p data-testid="description">
        <CollectionDescription />
      </p>,
    );
    expect(screen.getByTestId('description')).toHaveTextContent('Your animals, their molts and photos. Species names follow the catalogue.');
    expect(screen.getByRole('link', { name: 'catalogue' })).toHaveAttribute('href', '/species');
  });

  it('links the German word in a German interface', async () => {
    await i18next.changeLanguage('de');
    renderWithProviders(
      <p data-testid="description">
        <CollectionDescription />
      </p>,
    );
    expect(screen.getByTestId('description')).toHaveTextContent('Deine Tiere, ihre Häutungen und Fotos. Die Artnamen folgen dem Katalog.');
    expect(screen.getByRole('link', { name: 'Katalog' })).toHaveAttribute('href', '/species');
  });
});

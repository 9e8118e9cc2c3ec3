import { screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { i18next } from '@/lib/i18n';
import { renderWithProviders } from '@/testing/render';
import { CollectionDescription } from './collection';

afterEach(async () => {
  await i18next.changeLanguage('en');
});

describe('the collection page description', () => {
  it.each([
    ['en', 'Your animals, their molts and photos. Species names follow the catalogue.', 'catalogue'],
    ['de', 'Deine Tiere, ihre Häutungen und Fotos. Die Artnamen folgen dem Katalog.', 'Katalog'],
  ])('is one sentence (%s) whose linked word opens the species pages', async (language, sentence, linked) => {
    await i18next.changeLanguage(language);
    renderWithProviders(
      <p data-testid="description">
        <CollectionDescription />
      </p>,
    );
    expect(screen.getByTestId('description')).toHaveTextContent(sentence);
    expect(screen.getByRole('link', { name: linked })).toHaveAttribute('href', '/species');
  });
});

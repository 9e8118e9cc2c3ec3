import { screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { i18next } from '@/lib/i18n';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { countryOptions, PayoutSetup } from './payout-setup';

afterEach(async () => {
  vi.unstubAllGlobals();
  await i18next.changeLanguage('en');
});

const NOT_LINKED = { linked: false, accountId: null, chargesEnabled: false, payoutsEnabled: false, detailsSubmitted: false, onboardingUrl: null };

describe('PayoutSetup', { timeout: 30_000 }, () => {
  it('names the countries in the reader’s language (ISO 3166-1 codes; names from Unicode CLDR through ECMA-402 Intl.DisplayNames)', () => {
    const en = countryOptions('en');
    const de = countryOptions('de');
    expect(en[0]).toEqual({ value: 'DE', label: 'Germany' });
    expect(de[0]).toEqual({ value: 'DE', label: 'Deutschland' });
    expect(de.find((c) => c.value === 'AT')?.label).toBe('Österreich');
    expect(en.map((c) => c.value)).toEqual(de.map((c) => c.value));
  });

  it('speaks German to a German reader who has no payout account yet', async () => {
    await i18next.changeLanguage('de');
    const { fetchStub } = stubFetch({ 'GET /api/settlements/payout-account': () => ({ status: 200, body: NOT_LINKED }) });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<PayoutSetup />);
    expect(await screen.findByText('Nicht eingerichtet')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Auszahlungen einrichten' })).toBeInTheDocument();
    const country = screen.getByRole('combobox', { name: 'Land deines Bankkontos' });
    expect(country).toHaveValue('DE');
    expect(screen.getByRole('option', { name: 'Deutschland' })).toBeInTheDocument();
  });
});

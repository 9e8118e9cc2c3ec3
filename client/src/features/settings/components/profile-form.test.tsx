import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Me } from '@broodsilk/shared';
import { i18next } from '@/lib/i18n';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { ProfileForm } from './profile-form';

const me: Me = {
  id: 'u1',
  email: 'keeper@example.test',
  displayName: 'Mira Keeper',
  role: 'keeper',
  timeZone: 'Europe/Berlin',
  temperatureUnit: 'C',
  secondFactorEnabled: false,
  secondFactorRequired: false,
  language: 'en',
  stageNumbering: 'us',
};

afterEach(async () => {
  vi.unstubAllGlobals();
  await i18next.changeLanguage('en');
});

describe('ProfileForm', { timeout: 30_000 }, () => {
  it('lets the keeper choose German, °F and the German stage count, and sends exactly those', async () => {
    const { fetchStub, calls } = stubFetch({
      'PATCH /api/users/me': (init) => ({ status: 200, body: { ...me, ...JSON.parse(String(init?.body)) } }),
    });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<ProfileForm me={me} />);
    // The dropdown stays display:none in jsdom (its transition never runs), so options are found with hidden: true.
    await userEvent.click(screen.getByLabelText(/^Language/, { selector: 'input' }));
    await userEvent.click(await screen.findByRole('option', { name: 'Deutsch', hidden: true }));
    await userEvent.click(screen.getByRole('radio', { name: '°F' }));
    await userEvent.click(screen.getByLabelText(/^Counting the young’s stages/, { selector: 'input' }));
    await userEvent.click(await screen.findByRole('option', { name: 'German count (N1, N2 …)', hidden: true }));
    await userEvent.click(screen.getByRole('button', { name: 'Save settings' }));
    await waitFor(() => expect(calls.some((c) => c.method === 'PATCH')).toBe(true));
    expect(calls.find((c) => c.method === 'PATCH')?.body).toEqual({
      displayName: 'Mira Keeper',
      timeZone: 'Europe/Berlin',
      language: 'de',
      temperatureUnit: 'F',
      stageNumbering: 'de',
    });
  });

  it('speaks German to a German reader', async () => {
    await i18next.changeLanguage('de');
    renderWithProviders(<ProfileForm me={{ ...me, language: 'de' }} />);
    expect(screen.getByLabelText(/^Sprache/, { selector: 'input' })).toHaveValue('Deutsch');
    expect(screen.getByText('Temperatureinheit')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Einstellungen speichern' })).toBeInTheDocument();
  });
});

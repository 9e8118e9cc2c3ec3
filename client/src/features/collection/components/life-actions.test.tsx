import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { AnimalResponse } from '@broodsilk/shared';
import { dayjs } from '@/lib/dates';
import { i18next } from '@/lib/i18n';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { LifeActions } from './life-actions';
import { pastDateError } from './dated-step-form';

afterEach(async () => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
  await i18next.changeLanguage('en');
});

// An invented loaned male; only the fields the actions read matter.
const male = {
  id: 'm1',
  label: 'Brass',
  sex: 'male',
  maturity: 'mature',
  status: 'active',
  custody: 'loan-in',
  editable: true,
  premoltSince: null,
  spermWebOn: null,
  returnedOn: null,
  maturingWindow: null,
} as unknown as AnimalResponse;

const today = () => dayjs().format('YYYY-MM-DD');

describe('LifeActions', () => {
  it('offers the return to the owner for a loaned male, dated today unless changed', async () => {
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/animals/m1/return': () => ({ status: 200, body: { ...male, status: 'returned' } }),
    });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<LifeActions animal={male} />);
    expect(screen.getByRole('button', { name: 'Sperm web seen' })).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Returned to owner' }));
    const date = await screen.findByLabelText(/Returned on/);
    expect(date).toHaveValue(today());
    await userEvent.click(screen.getByRole('button', { name: 'Confirm the return' }));
    await waitFor(() => expect(calls.find((c) => c.path === '/api/animals/m1/return')?.body).toEqual({ on: today() }));
  });

  it('offers no return for an animal that is not on loan, and shows its facts', () => {
    renderWithProviders(<LifeActions animal={{ ...male, custody: 'with-owner', spermWebOn: '2026-10-01' } as AnimalResponse} />);
    expect(screen.queryByRole('button', { name: 'Returned to owner' })).toBeNull();
    expect(screen.getByRole('button', { name: 'Record death' })).toBeInTheDocument();
    expect(screen.getByText(/Last sperm web seen/)).toBeInTheDocument();
  });

  it('takes a date typed the German way from a German reader and sends it as its ISO date (ISO 8601)', async () => {
    await i18next.changeLanguage('de');
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/animals/m1/sperm-web': () => ({ status: 200, body: { ...male, spermWebOn: '2025-03-14' } }),
    });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<LifeActions animal={male} />);
    await userEvent.click(screen.getByRole('button', { name: 'Spermanetz gesehen' }));
    const date = await screen.findByLabelText(/Gesehen am/);
    await userEvent.clear(date);
    await userEvent.type(date, '14.03.2025');
    expect(date).toHaveAccessibleDescription('14. März 2025');
    await userEvent.click(screen.getByRole('button', { name: 'Speichern' }));
    await waitFor(() => expect(calls.find((c) => c.path === '/api/animals/m1/sperm-web')?.body).toEqual({ on: '2025-03-14' }));
  });

  it('accepts today and past dates, refuses a future one with a message', () => {
    expect(pastDateError('2026-06-01', '2026-06-01')).toBeNull();
    expect(pastDateError('2025-12-31', '2026-06-01')).toBeNull();
    expect(pastDateError('2026-06-02', '2026-06-01')).toBe('The date cannot be in the future.');
    expect(pastDateError(null, '2026-06-01')).toBe('Give the date.');
    // A day-first date from a British browser is read in its own order (14 March), not refused.
    vi.spyOn(navigator, 'language', 'get').mockReturnValue('en-GB');
    expect(pastDateError('14/03/2026', '2026-06-01')).toBeNull();
  });
});

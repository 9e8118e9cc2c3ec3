import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { TEXT_LIMITS, type FeedingResponse } from '@broodsilk/shared';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { FeedingForm } from './feeding-form';

afterEach(() => vi.unstubAllGlobals());

function setup(correcting?: FeedingResponse) {
  const { fetchStub, calls } = stubFetch({
    'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
    'POST /api/animals/a1/feedings': () => ({ status: 201, body: { id: 'f2' } }),
  });
  vi.stubGlobal('fetch', fetchStub);
  const onDone = vi.fn();
  renderWithProviders(<FeedingForm animalId="a1" correcting={correcting} onDone={onDone} />);
  return { calls, onDone };
}

describe('FeedingForm', { timeout: 30_000 }, () => {
  it('refuses prey longer than the server allows (TEXT_LIMITS.prey), keeping the text as typed', async () => {
    const { calls } = setup();
    const prey = screen.getByLabelText(/^Prey/);
    const long = 'cricket '.repeat(26); // 208 characters
    await userEvent.click(prey);
    await userEvent.paste(long);
    await userEvent.click(screen.getByRole('button', { name: 'Save feeding' }));
    await waitFor(() => expect(prey).toHaveAccessibleDescription(new RegExp(`${long.length - TEXT_LIMITS.prey} characters too long`)));
    expect(prey).toHaveValue(long);
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  });

  it('asks why an entry is corrected before striking it', async () => {
    const old = { id: '0b6f7c9e-1d2a-4e5b-8c7d-6a5b4c3d2e1f', fedOn: '2026-11-20', prey: '1 roach', taken: false, note: null } as unknown as FeedingResponse;
    const { calls } = setup(old);
    await userEvent.click(screen.getByRole('button', { name: 'Save the correction' }));
    const reason = screen.getByLabelText(/Why the old entry was wrong/);
    await waitFor(() => expect(reason).toHaveAccessibleDescription('Say briefly why the entry is corrected.'));
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
    await userEvent.type(reason, 'Wrong day');
    await userEvent.click(screen.getByRole('button', { name: 'Save the correction' }));
    await waitFor(() =>
      expect(calls.find((c) => c.method === 'POST')?.body).toEqual({
        fedOn: '2026-11-20',
        prey: '1 roach',
        taken: false,
        note: null,
        strikes: old.id,
        reason: 'Wrong day',
      }),
    );
  });
});

import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { MoltForm } from './molt-form';

afterEach(() => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

const ANIMAL = 'a1';

function setup() {
  vi.spyOn(navigator, 'language', 'get').mockReturnValue('en-GB');
  const { fetchStub, calls } = stubFetch({
    'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
    [`POST /api/animals/${ANIMAL}/molts`]: () => ({ status: 201, body: { id: 'm1' } }),
  });
  vi.stubGlobal('fetch', fetchStub);
  const onDone = vi.fn();
  renderWithProviders(<MoltForm animalId={ANIMAL} sex="female" onDone={onDone} />);
  return { calls, onDone };
}

describe('MoltForm', { timeout: 30_000 }, () => {
  it('refuses a future molt date and a 900 cm leg span with messages, keeping both as typed', async () => {
    const { calls } = setup();
    const date = screen.getByLabelText(/Molted on/);
    const size = screen.getByLabelText(/Leg span/);
    await userEvent.type(date, '2031-05-05');
    await userEvent.type(size, '900');
    await userEvent.click(screen.getByRole('button', { name: 'Save molt' }));
    await waitFor(() => expect(date).toHaveAccessibleDescription(/cannot be in the future/));
    expect(size).toHaveAccessibleDescription('The leg span is from 0.1 to 40 cm.');
    expect(date).toHaveValue('2031-05-05');
    expect(size).toHaveValue('900');
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  });

  it('sends a day-first date as typed, as its ISO date', async () => {
    const { calls, onDone } = setup();
    await userEvent.type(screen.getByLabelText(/Molted on/), '14/03/2025');
    expect(screen.getByLabelText(/Molted on/)).toHaveAccessibleDescription('14 March 2025');
    await userEvent.type(screen.getByLabelText(/Leg span/), '12.5');
    await userEvent.click(screen.getByRole('button', { name: 'Save molt' }));
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(calls.find((c) => c.method === 'POST')?.body).toMatchObject({ moltedOn: '2025-03-14', sizeCm: 12.5 });
  });
});

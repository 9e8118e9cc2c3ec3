import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { BroodCountResponse, BroodCountsResponse, OpeningResponse } from '@broodsilk/shared';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { BroodCounts } from './brood-counts';
import { OpeningPanel } from './opening-panel';

// Corrections strike the old record and keep it visible (docs/product.md, Data rules, Corrections).
afterEach(() => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

const by = { id: 'u1', name: 'Mira' };
const count = (over: Partial<BroodCountResponse>): BroodCountResponse => ({
  id: 'c1',
  sacId: 's1',
  at: '2026-03-10T09:00:00.000Z',
  stage: 'first-instar',
  alive: 40,
  lost: 0,
  lossReason: null,
  note: null,
  source: 'count',
  recordedBy: by,
  estimated: false,
  corrects: null,
  reason: null,
  struckBy: null,
  warningReason: null,
  ...over,
});

describe('Correct buttons', { timeout: 30_000 }, () => {
  it('corrects a brood count with a reason; the struck count stays listed and marked, "about" for an estimate', async () => {
    const list: BroodCountsResponse = {
      current: 38,
      currentEstimated: true,
      counts: [
        count({ id: 'c0', source: 'opening', at: '2026-03-01T09:00:00.000Z', alive: 42 }),
        count({ id: 'c1', alive: 45, struckBy: 'c2' }),
        count({ id: 'c2', alive: 38, estimated: true, corrects: 'c1', reason: 'Counted a tray twice' }),
      ],
    };
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'GET /api/sacs/s1/counts': () => ({ status: 200, body: list }),
      'POST /api/sacs/s1/counts': () => ({ status: 201, body: count({ id: 'c3' }) }),
    });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<BroodCounts sacId="s1" timeZone="UTC" canRecord stage="first-instar" />);
    const struck = await screen.findByTestId('count-struck');
    expect(struck).toHaveTextContent('45 (struck: corrected)');
    expect(screen.getByText(/^Alive now:/)).toHaveTextContent('Alive now: about 38 (an estimate: shares from it are provisional)');
    expect(screen.getByText('Correction: Counted a tray twice')).toBeInTheDocument();
    // Only the count in force can be corrected here; the opening's own count is corrected at the opening.
    const buttons = screen.getAllByRole('button', { name: /^Correct the count of/ });
    expect(buttons).toHaveLength(1);
    await userEvent.click(buttons[0]!);
    const form = screen.getByRole('form', { name: 'Correct the count' });
    const alive = within(form).getByLabelText('Alive');
    await userEvent.clear(alive);
    await userEvent.type(alive, '36');
    await userEvent.click(within(form).getByRole('button', { name: 'Save the correction' }));
    await waitFor(() => expect(within(form).getByLabelText('Why the count was wrong')).toHaveAccessibleDescription('Say briefly why the count was wrong.'));
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
    await userEvent.type(within(form).getByLabelText('Why the count was wrong'), 'Two were moults, not young');
    await userEvent.click(within(form).getByRole('button', { name: 'Save the correction' }));
    await waitFor(() => expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1));
    expect(calls.find((c) => c.method === 'POST')?.body).toMatchObject({ alive: 36, estimated: true, corrects: 'c2', reason: 'Two were moults, not young' });
  });

  it('corrects the opening with a reason and shows the struck version marked', async () => {
    const fields = {
      sacId: 's1',
      openedAt: '2026-03-01T09:00:00.000Z',
      healthyEggs: 5,
      eggsWithLegs: 0,
      nymphs: 0,
      darkEggs: 150,
      spoiledEggs: 40,
      keptBack: 5,
      viable: 5,
      total: 195,
      notes: null,
      estimated: false,
      warningReason: null,
      recordedBy: by,
    };
    const opening: OpeningResponse = {
      ...fields,
      id: 'o2',
      corrects: 'o1',
      reason: 'Dark and spoiled swapped',
      photos: [],
      struck: [{ ...fields, id: 'o1', darkEggs: 40, spoiledEggs: 150, corrects: null, reason: null }],
    };
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'GET /api/sacs/s1/opening': () => ({ status: 200, body: opening }),
      'POST /api/sacs/s1/opening': () => ({ status: 201, body: opening }),
    });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<OpeningPanel sac={{ id: 's1', opened: true }} timeZone="UTC" canEdit />);
    expect(await screen.findByTestId('opening-struck')).toHaveTextContent(/^Struck: Opened/);
    expect(screen.getByTestId('opening-in-force')).toHaveTextContent('Corrected because: Dark and spoiled swapped');
    await userEvent.click(screen.getByRole('button', { name: 'Correct the opening' }));
    const form = screen.getByRole('form', { name: 'Correct the opening' });
    const spoiled = within(form).getByLabelText('Spoiled');
    expect(spoiled).toHaveValue('40');
    await userEvent.clear(spoiled);
    await userEvent.type(spoiled, '39');
    await userEvent.type(within(form).getByLabelText('Why the recorded opening was wrong'), 'One spoiled egg was a clump of silk');
    await userEvent.click(within(form).getByRole('button', { name: 'Save the correction' }));
    await waitFor(() => expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1));
    expect(calls.find((c) => c.method === 'POST')?.body).toMatchObject({
      spoiledEggs: 39,
      darkEggs: 150,
      keptBack: 5,
      corrects: 'o2',
      reason: 'One spoiled egg was a clump of silk',
    });
  });
});

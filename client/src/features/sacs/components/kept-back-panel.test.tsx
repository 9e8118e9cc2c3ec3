import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { KeptBackBatchResponse } from '@broodsilk/shared';
import { i18next } from '@/lib/i18n';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { KeptBackPanel } from './kept-back-panel';

afterEach(async () => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
  await i18next.changeLanguage('en');
});

const batch: KeptBackBatchResponse = {
  id: 'b1',
  sacId: 's1',
  eggs: 5,
  keptAt: '2026-03-01T09:00:00.000Z',
  state: 'incubating',
  endedAt: null,
  joined: null,
  reason: null,
  endedBy: null,
  rolls: 1,
  lastRollAt: '2026-03-02T08:00:00.000Z',
  log: [{ id: 'e1', kind: 'roll', at: '2026-03-02T08:00:00.000Z', note: null, recordedBy: { id: 'u', name: 'Ines' }, strikes: null, struckBy: null }],
};

// The batch ends once, joined into the brood or written off (docs/product.md, Words: kept-back eggs).
describe('KeptBackPanel', { timeout: 30_000 }, () => {
  it('counts the batch into the brood: refuses more than were kept back, then asks once and sends how many joined', async () => {
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'GET /api/sacs/s1/kept-back': () => ({ status: 200, body: batch }),
      'POST /api/sacs/s1/kept-back/end': () => ({ status: 201, body: batch }),
    });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<KeptBackPanel sacId="s1" timeZone="UTC" canLog canEnd />);
    expect(await screen.findByTestId('kept-back-words')).toHaveTextContent(
      '5 eggs kept back at the opening on 1 Mar 2026 for more incubation: still incubating, rolled once, last on 2 Mar 2026.',
    );
    const form = screen.getByRole('form', { name: 'End the kept-back batch' });
    await userEvent.click(within(form).getByText('Joined the brood'));
    const joined = await within(form).findByLabelText('How many joined (of 5)');
    await userEvent.type(joined, '6');
    await userEvent.type(within(form).getByLabelText('Why'), 'Hatched a week late');
    await userEvent.click(within(form).getByRole('button', { name: 'Count into the brood' }));
    await waitFor(() => expect(joined).toHaveAccessibleDescription('A whole number from 0 to 5.'));
    expect(joined).toHaveValue('6');
    await userEvent.clear(joined);
    await userEvent.type(joined, '3');
    await userEvent.click(within(form).getByRole('button', { name: 'Count into the brood' }));
    const dialog = await screen.findByRole('dialog', { name: 'Count them into the brood' });
    expect(dialog).toHaveTextContent('3 of the 5 kept-back eggs join the brood; the next count may be up to 3 higher.');
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
    await userEvent.click(within(dialog).getByRole('button', { name: 'Count into the brood' }));
    await waitFor(() => expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1));
    expect(calls.find((c) => c.method === 'POST')?.body).toMatchObject({ outcome: 'joined', joined: 3, reason: 'Hatched a week late' });
  });

  it('offers a member without hands-on rights nothing to change', async () => {
    vi.stubGlobal('fetch', stubFetch({ 'GET /api/sacs/s1/kept-back': () => ({ status: 200, body: batch }) }).fetchStub);
    renderWithProviders(<KeptBackPanel sacId="s1" timeZone="UTC" canLog={false} canEnd={false} />);
    await screen.findByTestId('kept-back-words');
    expect(screen.queryByRole('form')).not.toBeInTheDocument();
    expect(screen.getByRole('table', { name: 'Log of the kept-back eggs' })).toHaveTextContent('Rolled');
  });

  it('speaks German to a German reader, and a batch of one egg in the singular', async () => {
    // Plural categories by Intl.PluralRules (CLDR): German 1 is "one", 5 is "other".
    await i18next.changeLanguage('de');
    const { fetchStub, calls } = stubFetch({ 'GET /api/sacs/s1/kept-back': () => ({ status: 200, body: { ...batch, eggs: 1 } }) });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<KeptBackPanel sacId="s1" timeZone="UTC" canLog canEnd />);
    expect(await screen.findByRole('table', { name: 'Protokoll der zurückbehaltenen Eier' })).toHaveTextContent('Gedreht');
    const form = screen.getByRole('form', { name: 'Die zurückbehaltenen Eier abschließen' });
    await userEvent.type(within(form).getByLabelText('Warum'), 'Eingetrocknet');
    await userEvent.click(within(form).getByRole('button', { name: 'Abschreiben' }));
    const dialog = await screen.findByRole('dialog', { name: 'Abschreiben' });
    expect(dialog).toHaveTextContent('Das eine zurückbehaltene Ei wird abgeschrieben; es kommt nie zur Nachzucht.');
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  });
});

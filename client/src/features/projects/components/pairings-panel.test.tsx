import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { PairingResponse } from '@broodsilk/shared';
import { i18next } from '@/lib/i18n';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { PairingsPanel } from './pairings-panel';

// Product rules (docs/product.md, Corrections): a correction is a new row that strikes the old one, with a reason.
afterEach(() => vi.unstubAllGlobals());

const pairing = (over: Partial<PairingResponse>): PairingResponse => ({
  id: 'p-a',
  startedAt: '2026-10-01T18:00:00Z',
  on: '2026-10-01',
  male: { id: 'm-first', label: 'Ember' },
  durationMinutes: 20,
  outcome: 'interest-only',
  notes: null,
  recordedBy: { id: 'u-mira', name: 'Mira' },
  createdAt: '2026-10-01T19:00:00Z',
  corrects: null,
  reason: null,
  struckBy: null,
  warningReason: null,
  ...over,
});
const males = [
  { value: 'm-backup', label: 'Cinder (backup)' },
  { value: 'm-first', label: 'Ember (died)' },
];

function stub(list: PairingResponse[]) {
  return stubFetch({
    'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
    'GET /api/projects/p1/pairings': () => ({ status: 200, body: list }),
    'POST /api/projects/p1/pairings': () => ({ status: 201, body: pairing({ id: 'p-new' }) }),
  });
}

describe('PairingsPanel', () => {
  it('shows a corrected pairing struck through beside the correction and its reason, with no second Correct on the struck one', async () => {
    const list = [pairing({ id: 'p-b', outcome: 'connected', corrects: 'p-a', reason: 'They did connect' }), pairing({ id: 'p-a', struckBy: 'p-b' })];
    vi.stubGlobal('fetch', stub(list).fetchStub);
    renderWithProviders(<PairingsPanel projectId="p1" timeZone="UTC" canRecord canCorrect males={males} />);
    const rows = await screen.findAllByTestId('pairing-row');
    expect(rows).toHaveLength(2);
    expect(rows[1]).toHaveAttribute('data-struck', 'true');
    expect(rows[1]).toHaveTextContent('Corrected, no longer counts');
    expect(rows[0]).toHaveTextContent('Correction: They did connect');
    expect(rows[0]).toHaveTextContent('Ember');
    expect(within(rows[0]!).getByRole('button', { name: /Correct the pairing/ })).toBeInTheDocument();
    expect(within(rows[1]!).queryByRole('button', { name: /Correct the pairing/ })).not.toBeInTheDocument();
  });

  it('corrects a pairing only with a reason, sending the struck id and the male', async () => {
    const { fetchStub, calls } = stub([pairing({})]);
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<PairingsPanel projectId="p1" timeZone="UTC" canRecord canCorrect males={males} />);
    await userEvent.click(await screen.findByRole('button', { name: /Correct the pairing/ }));
    const form = screen.getByTestId('pairing-correction-form');
    await userEvent.click(within(form).getByRole('button', { name: 'Save correction' }));
    expect(await within(form).findByText('Say briefly why the recorded pairing was wrong.')).toBeInTheDocument();
    expect(calls.some((c) => c.method === 'POST')).toBe(false);
    await userEvent.type(within(form).getByLabelText(/Why the recorded pairing was wrong/), 'Wrong day');
    await userEvent.click(within(form).getByRole('button', { name: 'Save correction' }));
    await waitFor(() => expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1));
    expect(calls.find((c) => c.method === 'POST')!.body).toMatchObject({
      corrects: 'p-a',
      reason: 'Wrong day',
      maleId: 'm-first',
      startedAt: '2026-10-01T18:00:00.000Z',
      durationMinutes: 20,
      outcome: 'interest-only',
    });
  }, 20_000); // several typed and clicked steps; a shared 2-core machine needs more than the 5 s default

  it('offers neither recording nor correcting to a member who is not the keeper', async () => {
    vi.stubGlobal('fetch', stub([pairing({})]).fetchStub);
    renderWithProviders(<PairingsPanel projectId="p1" timeZone="UTC" canRecord={false} canCorrect={false} males={[]} />);
    expect(await screen.findByTestId('pairing-row')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Correct/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Record a pairing' })).not.toBeInTheDocument();
  });

  it('asks a German reader in German, the correction refused with a German message', async () => {
    vi.stubGlobal('fetch', stub([pairing({})]).fetchStub);
    await i18next.changeLanguage('de');
    try {
      renderWithProviders(<PairingsPanel projectId="p1" timeZone="UTC" canRecord canCorrect males={males} />);
      const row = await screen.findByTestId('pairing-row');
      // catalogue pairingOutcome['interest-only'] in German
      expect(row).toHaveTextContent('Nur Interesse');
      expect(screen.getByRole('columnheader', { name: 'Männchen' })).toBeInTheDocument();
      await userEvent.click(within(row).getByRole('button', { name: /Die Verpaarung vom .* korrigieren/ }));
      const form = screen.getByTestId('pairing-correction-form');
      await userEvent.click(within(form).getByRole('button', { name: 'Korrektur speichern' }));
      expect(await within(form).findByText('Sag kurz, warum die eingetragene Verpaarung falsch war.')).toBeInTheDocument();
    } finally {
      await i18next.changeLanguage('en');
    }
  }, 20_000);
});

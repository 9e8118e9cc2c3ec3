import { screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { i18next } from '@/lib/i18n';
import { EntriesTable } from './entries-table';
import { SharesPanel } from './shares-panel';
import { entry, PROJECT_ID, shares } from './account.fixtures';

afterEach(() => vi.unstubAllGlobals());

describe('EntriesTable', () => {
  it('links a correction to the entry it reverses and marks that one reversed, with the reason', async () => {
    const handOver = entry({ status: 'reversed', awaitingConfirmationBy: null });
    const correction = entry({
      id: '66666666-6666-4666-8666-666666666666',
      seq: 2,
      kind: 'correction',
      party: null,
      count: null,
      method: null,
      reversesId: handOver.id,
      reason: 'Counted twice',
      status: 'in-force',
      awaitingConfirmationBy: null,
    });
    vi.stubGlobal(
      'fetch',
      stubFetch({ [`GET /api/projects/${PROJECT_ID}/entries`]: () => ({ status: 200, body: { items: [handOver, correction], nextCursor: null } }) }).fetchStub,
    );
    renderWithProviders(<EntriesTable projectId={PROJECT_ID} />);
    const table = await screen.findByRole('table', { name: 'Account entries' });
    const [first, second] = within(table).getAllByRole('row').slice(1);
    expect(within(first!).getByText('Reversed')).toBeInTheDocument();
    expect(within(first!).getByRole('link', { name: 'by correction #2' })).toHaveAttribute('href', '#account-entry-2');
    expect(within(second!).getByRole('link', { name: '#1 hand-over' })).toHaveAttribute('href', '#account-entry-1');
    expect(within(second!).getByText('Why: Counted twice')).toBeInTheDocument();
    expect(within(table).queryByRole('button')).not.toBeInTheDocument();
  });
});

describe('SharesPanel', () => {
  it('says what a failed sac means under the terms and what changed in the shares and why', async () => {
    const body = shares();
    body.sacs.push({
      ...body.sacs[0]!,
      sacId: '77777777-7777-4777-8777-777777777777',
      layDate: '2026-06-01',
      outcome: 'failed',
      count: 0,
      aliveInCare: 0,
      withdrawn: 0,
      parties: [],
      explanation: [],
      failure: 'The sac failed: under the terms nothing is owed for it.',
    });
    body.sacs[0]!.change = {
      changedAt: '2026-11-28T09:00:00.000Z',
      reasons: ['The count went from 24 to 20.'],
      lines: ['Tomasz: 10 → 8'],
      changes: [],
    };
    vi.stubGlobal('fetch', stubFetch({ [`GET /api/projects/${PROJECT_ID}/shares`]: () => ({ status: 200, body }) }).fetchStub);
    renderWithProviders(<SharesPanel projectId={PROJECT_ID} timeZone="Europe/Berlin" />);
    expect(await screen.findByText('The sac failed: under the terms nothing is owed for it.')).toBeInTheDocument();
    const change = screen.getByTestId('share-change');
    expect(change).toHaveTextContent('What changed and why');
    expect(change).toHaveTextContent('The count went from 24 to 20.');
    expect(change).toHaveTextContent('Tomasz: 10 → 8');
    expect(screen.getByText('20 young are shared 3 : 2.')).toBeInTheDocument();
    // the terms line names the failure clause in the catalogue's one wording (failureClauseText)
    expect(screen.getByText(/Terms version 1 in force/)).toHaveTextContent(/· Under these terms nothing is owed when a project fails\.$/);
  });

  it('says the terms in force in the German reader’s words, the failure clause included', async () => {
    await i18next.changeLanguage('de');
    try {
      vi.stubGlobal('fetch', stubFetch({ [`GET /api/projects/${PROJECT_ID}/shares`]: () => ({ status: 200, body: shares() }) }).fetchStub);
      renderWithProviders(<SharesPanel projectId={PROJECT_ID} timeZone="Europe/Berlin" />);
      expect(await screen.findByText(/Fassung 1 der Bedingungen gilt/)).toHaveTextContent(
        /Nach diesen Bedingungen schuldet niemand etwas, wenn ein Projekt scheitert\.$/,
      );
    } finally {
      await i18next.changeLanguage('en');
    }
  });
});

import { screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { BalancesPanel } from './balances-panel';
import { balances, MIRA, party, PROJECT_ID, TOMASZ } from './account.fixtures';

afterEach(() => vi.unstubAllGlobals());

describe('BalancesPanel', () => {
  it('shows the netted money line and the spiderlings still owed per party', async () => {
    const { fetchStub, calls } = stubFetch({ [`GET /api/projects/${PROJECT_ID}/balances`]: () => ({ status: 200, body: balances() }) });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<BalancesPanel projectId={PROJECT_ID} />);
    expect(await screen.findByText('Tomasz owes Mira €12.00')).toBeInTheDocument();
    const table = screen.getByRole('table', { name: 'Balances' });
    const tomasz = within(table).getByRole('row', { name: /Tomasz/ });
    // still owed 5; share 8, handed over 3, sold 0, cashed out 0
    expect(
      within(tomasz)
        .getAllByRole('cell')
        .map((c) => c.textContent),
    ).toEqual(['Tomasz', '5', '8', '3', '0', '0']);
    expect(screen.getByTestId(`owed-${MIRA.memberId}`)).toHaveTextContent('12');
    expect(calls).toEqual([{ method: 'GET', path: `/api/projects/${PROJECT_ID}/balances`, body: undefined }]);
  });

  it('formats a currency without minor units from its minor units, and says when nothing is owed', async () => {
    const yen = balances({
      currency: 'JPY',
      debts: [{ fromPartyId: MIRA.memberId, toPartyId: TOMASZ.memberId, amountMinor: 1500, currency: 'JPY', fromName: 'Mira', toName: 'Tomasz' }],
    });
    const { fetchStub } = stubFetch({ [`GET /api/projects/${PROJECT_ID}/balances`]: () => ({ status: 200, body: yen }) });
    vi.stubGlobal('fetch', fetchStub);
    const { unmount } = renderWithProviders(<BalancesPanel projectId={PROJECT_ID} />);
    expect(await screen.findByText('Mira owes Tomasz ¥1,500')).toBeInTheDocument();
    unmount();

    const even = balances({ parties: [party(MIRA, { share: 4 }), party(TOMASZ, { share: 2, handedOver: 3, owedSpiderlings: -1 })], debts: [], settled: false });
    vi.stubGlobal('fetch', stubFetch({ [`GET /api/projects/${PROJECT_ID}/balances`]: () => ({ status: 200, body: even }) }).fetchStub);
    renderWithProviders(<BalancesPanel projectId={PROJECT_ID} />);
    expect(await screen.findByText('No money is owed between parties.')).toBeInTheDocument();
    expect(screen.getByTestId(`owed-${TOMASZ.memberId}`)).toHaveTextContent('1 over the share');
  });

  // docs/product.md, Shares and balances: shares from an estimated count say "about" and are provisional.
  it('says "about" for each share and that the shares are provisional when a count behind them is an estimate', async () => {
    vi.stubGlobal(
      'fetch',
      stubFetch({ [`GET /api/projects/${PROJECT_ID}/balances`]: () => ({ status: 200, body: balances({ provisional: true }) }) }).fetchStub,
    );
    renderWithProviders(<BalancesPanel projectId={PROJECT_ID} />);
    const tomasz = within(await screen.findByRole('table', { name: 'Balances' })).getByRole('row', { name: /Tomasz/ });
    expect(within(tomasz).getAllByRole('cell')[2]).toHaveTextContent('about 8');
    expect(screen.getByText(/these shares are provisional/)).toBeInTheDocument();
  });
});

import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { todayIn, type Me } from '@broodsilk/shared';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { AccountPanel } from './account-panel';
import { balances, entry, MIRA, PROJECT_ID, shares, TOMASZ } from './account.fixtures';

afterEach(() => vi.unstubAllGlobals());

const me = (displayName: string): Me => ({
  id: `user-${displayName}`,
  email: `${displayName}@example.test`,
  displayName,
  role: 'keeper',
  timeZone: 'Europe/Berlin',
  temperatureUnit: 'C',
  secondFactorEnabled: false,
  secondFactorRequired: false,
  language: 'en',
  stageNumbering: 'us',
});
const HAND_OVER = entry({});

function stubAccount() {
  const base = `/api/projects/${PROJECT_ID}`;
  return stubFetch({
    'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
    [`GET ${base}/shares`]: () => ({ status: 200, body: shares() }),
    [`GET ${base}/balances`]: () => ({ status: 200, body: balances() }),
    [`GET ${base}/entries`]: () => ({ status: 200, body: { items: [HAND_OVER], nextCursor: null } }),
    [`POST ${base}/entries/${HAND_OVER.id}/confirm`]: () => ({ status: 201, body: { ...HAND_OVER, status: 'in-force', awaitingConfirmationBy: null } }),
    'GET /api/settlements/payout-account': () => ({
      status: 200,
      body: { linked: false, accountId: null, chargesEnabled: false, payoutsEnabled: false, detailsSubmitted: false, onboardingUrl: null },
    }),
  });
}

describe('AccountPanel', { timeout: 30_000 }, () => {
  it('a partner sees no owner actions, confirms receipt of a hand-over to them and is offered to pay what they owe', async () => {
    const { fetchStub, calls } = stubAccount();
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<AccountPanel projectId={PROJECT_ID} me={me('Tomasz')} myRole="partner" myMemberId={TOMASZ.memberId} />);

    const waiting = await screen.findByTestId('section-awaiting');
    expect(within(waiting).getByText(/3 spiderlings handed over to you/)).toBeInTheDocument();
    expect(await screen.findByRole('button', { name: 'Pay what you owe' })).toBeInTheDocument();
    expect(screen.getByText('You owe Mira €12.00.')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Record a hand-over' })).not.toBeInTheDocument();
    expect(screen.queryByTestId('section-actions')).not.toBeInTheDocument();
    // A partner's statement is their own: no party picker.
    expect(within(screen.getByTestId('section-statement')).queryByLabelText('Statement for')).not.toBeInTheDocument();
    expect(within(screen.getByTestId('section-statement')).getByRole('link', { name: 'Download CSV' })).toHaveAttribute(
      'href',
      `/api/projects/${PROJECT_ID}/statements/${TOMASZ.memberId}.csv`,
    );

    const alive = within(waiting).getByLabelText('Arrived alive');
    await userEvent.clear(alive);
    await userEvent.type(alive, '2');
    const dead = within(waiting).getByLabelText('Arrived dead');
    await userEvent.clear(dead);
    await userEvent.type(dead, '1');
    await userEvent.click(within(waiting).getByRole('button', { name: 'Confirm receipt' }));
    // Asked once, saying what it does; nothing is sent before the answer.
    const dialog = await screen.findByRole('dialog', { name: 'Confirm receipt' });
    expect(dialog).toHaveTextContent('You confirm that 2 of the 3 spiderlings arrived alive and 1 dead');
    expect(calls.some((c) => c.path.endsWith('/confirm'))).toBe(false);
    await userEvent.click(within(dialog).getByRole('button', { name: 'Yes, confirm receipt' }));
    await waitFor(() => expect(calls.some((c) => c.method === 'POST' && c.path.endsWith('/confirm'))).toBe(true));
    expect(calls.filter((c) => c.path.endsWith('/confirm'))).toHaveLength(1);
    expect(calls.find((c) => c.path.endsWith('/confirm'))?.body).toEqual({ arrivedAlive: 2, arrivedDead: 1, date: todayIn(me('Tomasz').timeZone, new Date()) });
    // The account is fetched again after the confirmation.
    await waitFor(() => expect(calls.filter((c) => c.method === 'GET' && c.path.endsWith('/balances')).length).toBeGreaterThan(1));
  });

  it('the owner has the actions, no "Confirm receipt" for a hand-over to someone else, and the payout set-up', async () => {
    const { fetchStub } = stubAccount();
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<AccountPanel projectId={PROJECT_ID} me={me('Mira')} myRole="owner" myMemberId={MIRA.memberId} />);
    expect(await screen.findByRole('button', { name: 'Record a hand-over' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Correct an entry' })).toBeInTheDocument();
    const table = await screen.findByRole('table', { name: 'Account entries' });
    expect(screen.queryByRole('button', { name: 'Confirm receipt' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Pay what you owe' })).not.toBeInTheDocument();
    expect(within(table).getByText('Waiting for Tomasz to confirm receipt')).toBeInTheDocument();
    expect(await screen.findByRole('button', { name: 'Set up payouts' })).toBeInTheDocument();
  });

  it("the owner's sale form carries the species' trade listing from the page (CITES Appendix II for every Brachypelma: docs/trade-facts.md §9)", async () => {
    const { fetchStub } = stubAccount();
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<AccountPanel projectId={PROJECT_ID} me={me('Mira')} myRole="owner" myMemberId={MIRA.memberId} tradeListing="CITES Appendix II" />);
    await userEvent.click(await screen.findByRole('button', { name: 'Record a sale' }));
    const form = await screen.findByRole('form', { name: 'Record a sale' });
    expect(within(form).getByTestId('safety-saleListed')).toHaveTextContent('CITES Appendix II');
    expect(within(form).getByTestId('safety-sale')).toBeInTheDocument();
  });
});

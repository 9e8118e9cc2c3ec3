import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ProjectMemberResponse, TermsListResponse, TermsVersionResponse } from '@broodsilk/shared';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { TermsPanel } from './terms-panel';

afterEach(() => vi.unstubAllGlobals());

const members: ProjectMemberResponse[] = [
  { id: 'm-owner', role: 'owner', name: 'Mira', email: null, userId: 'u-mira', hasAccount: true },
  { id: 'm-tomasz', role: 'partner', name: 'Tomasz', email: null, userId: 'u-tomasz', hasAccount: true },
];

function version(number: number, status: TermsVersionResponse['status'], tomaszAccepted: boolean, ownerWeight = 2): TermsVersionResponse {
  return {
    number,
    status,
    createdAt: '2026-11-01T10:00:00Z',
    createdBy: { id: 'u-mira', name: 'Mira' },
    pricePerSpiderlingMinor: 1250,
    currency: 'EUR',
    failureClause: 'carries-over',
    handOverStage: 'second-instar',
    shippingPaidBy: 'recipient',
    note: null,
    lines: [
      {
        memberId: 'm-owner',
        memberName: 'Mira',
        role: 'owner',
        weight: ownerWeight,
        fixedCount: 0,
        pickOrder: 1,
        share: ownerWeight === 2 ? '2/3' : '3/4',
        mustAccept: false,
        accepted: true,
      },
      {
        memberId: 'm-tomasz',
        memberName: 'Tomasz',
        role: 'partner',
        weight: 1,
        fixedCount: 5,
        pickOrder: 2,
        share: ownerWeight === 2 ? '1/3' : '1/4',
        mustAccept: true,
        accepted: tomaszAccepted,
      },
    ],
    acceptances: [],
    awaiting: tomaszAccepted ? [] : [{ memberId: 'm-tomasz', name: 'Tomasz' }],
  };
}

const twoVersions: TermsListResponse = { inForce: 1, versions: [version(1, 'in-force', true), version(2, 'proposed', false, 3)] };

function stub(list: TermsListResponse) {
  return stubFetch({
    'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
    'GET /api/projects/p1/terms': () => ({ status: 200, body: list }),
    'POST /api/projects/p1/terms/2/accept': () => ({ status: 200, body: version(2, 'in-force', true, 3) }),
  });
}

describe('TermsPanel', () => {
  it('shows the version in force and the proposed one apart, with shares and who still has to accept', async () => {
    vi.stubGlobal('fetch', stub(twoVersions).fetchStub);
    renderWithProviders(<TermsPanel projectId="p1" me={{ id: 'u-mira', timeZone: 'Europe/Berlin' }} myRole="owner" members={members} />);
    const inForce = await screen.findByTestId('terms-version-1');
    const proposed = screen.getByTestId('terms-version-2');
    expect(within(inForce).getByText('In force')).toBeInTheDocument();
    expect(within(inForce).getByText(/2\/3/)).toBeInTheDocument();
    expect(within(proposed).getByText('Proposed')).toBeInTheDocument();
    expect(within(proposed).getByText(/3\/4/)).toBeInTheDocument();
    expect(within(proposed).getByText('Waiting for Tomasz to accept.')).toBeInTheDocument();
    expect(within(inForce).queryByText(/Waiting for/)).not.toBeInTheDocument();
    // The owner proposed it: no accept button for them.
    expect(screen.queryByRole('button', { name: 'Accept these terms' })).not.toBeInTheDocument();
  });

  it('lets a partner who has not accepted accept the proposed version, and sends that version', async () => {
    const { fetchStub, calls } = stub(twoVersions);
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<TermsPanel projectId="p1" me={{ id: 'u-tomasz', timeZone: 'America/Chicago' }} myRole="partner" members={members} />);
    const proposed = await screen.findByTestId('terms-version-2');
    const button = within(proposed).getByRole('button', { name: 'Accept these terms' });
    expect(within(screen.getByTestId('terms-version-1')).queryByRole('button', { name: 'Accept these terms' })).not.toBeInTheDocument();
    await userEvent.click(button);
    // Asked once, saying what accepting means; nothing is sent before the answer.
    const dialog = await screen.findByRole('dialog', { name: 'Accept these terms' });
    expect(dialog).toHaveTextContent('You agree to version 2');
    expect(calls.some((c) => c.path.endsWith('/accept'))).toBe(false);
    await userEvent.click(within(dialog).getByRole('button', { name: 'Yes, accept version 2' }));
    await waitFor(() => expect(calls.some((c) => c.method === 'POST' && c.path === '/api/projects/p1/terms/2/accept')).toBe(true));
    expect(calls.filter((c) => c.path.endsWith('/accept'))).toHaveLength(1);
  });

  it('offers no accept button to a partner who already accepted', async () => {
    vi.stubGlobal('fetch', stub({ inForce: null, versions: [version(1, 'proposed', true)] }).fetchStub);
    renderWithProviders(<TermsPanel projectId="p1" me={{ id: 'u-tomasz', timeZone: 'UTC' }} myRole="partner" members={members} />);
    expect(await screen.findByTestId('terms-version-1')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Accept these terms' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Propose/ })).not.toBeInTheDocument();
  });

  it('offers no accept button to a caretaker', async () => {
    const withCaretaker = [...members, { id: 'm-ines', role: 'caretaker' as const, name: 'Ines', email: null, userId: 'u-ines', hasAccount: true }];
    vi.stubGlobal('fetch', stub(twoVersions).fetchStub);
    renderWithProviders(<TermsPanel projectId="p1" me={{ id: 'u-ines', timeZone: 'UTC' }} myRole="caretaker" members={withCaretaker} />);
    expect(await screen.findByTestId('terms-version-2')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Accept these terms' })).not.toBeInTheDocument();
  });
});

describe('ProposeTermsForm in the panel', { timeout: 30_000 }, () => {
  it('refuses a negative weight with a message instead of turning it into 0, and sends nothing', async () => {
    const { fetchStub, calls } = stub(twoVersions);
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<TermsPanel projectId="p1" me={{ id: 'u-mira', timeZone: 'Europe/Berlin' }} myRole="owner" members={members} />);
    await userEvent.click(await screen.findByRole('button', { name: 'Propose changed terms' }));
    const weight = screen.getAllByLabelText(/^Weight of /)[0]!;
    await userEvent.clear(weight);
    await userEvent.type(weight, '-5');
    await userEvent.click(screen.getByRole('button', { name: 'Propose this version' }));
    await waitFor(() => expect(weight).toHaveAccessibleDescription('A weight is a whole number from 0 to 1,000,000.'));
    expect(weight).toHaveValue('-5');
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  });
});

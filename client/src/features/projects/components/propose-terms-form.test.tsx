import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ProjectMemberResponse, TermsVersionResponse } from '@broodsilk/shared';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { ProposeTermsForm } from './propose-terms-form';

afterEach(() => vi.unstubAllGlobals());

const members: ProjectMemberResponse[] = [{ id: 'm-owner', role: 'owner', name: 'Mira', email: null, userId: 'u-mira', hasAccount: true }];

// ISO 4217: the yen has no minor unit, so 1250 minor units are ¥1250 (a copy that divided by 100 showed 12.5).
const yenVersion: TermsVersionResponse = {
  number: 1,
  status: 'in-force',
  createdAt: '2026-11-01T10:00:00Z',
  createdBy: { id: 'u-mira', name: 'Mira' },
  pricePerSpiderlingMinor: 1250,
  currency: 'JPY',
  failureClause: 'nothing-owed',
  handOverStage: 'second-instar',
  shippingPaidBy: 'recipient',
  note: null,
  lines: [{ memberId: 'm-owner', memberName: 'Mira', role: 'owner', weight: 1, fixedCount: 0, pickOrder: 1, share: '1/1', mustAccept: false, accepted: true }],
  acceptances: [],
  awaiting: [],
};

function renderForm() {
  const { fetchStub, calls } = stubFetch({
    'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
    'POST /api/projects/p1/terms': () => ({ status: 201, body: { ...yenVersion, number: 2, status: 'proposed' } }),
  });
  vi.stubGlobal('fetch', fetchStub);
  renderWithProviders(<ProposeTermsForm projectId="p1" members={members} base={yenVersion} />);
  return calls;
}

describe('ProposeTermsForm prices in a currency without minor units', { timeout: 30_000 }, () => {
  it('starts from the yen price as it is and sends it back unchanged', async () => {
    const calls = renderForm();
    await userEvent.click(screen.getByRole('button', { name: 'Propose changed terms' }));
    expect(screen.getByLabelText('Price per spiderling')).toHaveValue('1250');
    await userEvent.click(screen.getByRole('button', { name: 'Propose this version' }));
    await waitFor(() => expect(calls.find((c) => c.method === 'POST')?.body).toMatchObject({ pricePerSpiderlingMinor: 1250, currency: 'JPY' }));
  });

  it('refuses a fraction of a yen with a message at the field, and sends nothing', async () => {
    const calls = renderForm();
    await userEvent.click(screen.getByRole('button', { name: 'Propose changed terms' }));
    const price = screen.getByLabelText('Price per spiderling');
    await userEvent.clear(price);
    await userEvent.type(price, '12.5');
    await userEvent.click(screen.getByRole('button', { name: 'Propose this version' }));
    await waitFor(() => expect(price).toHaveAccessibleDescription('JPY has no smaller unit; give a whole amount.'));
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  });
});

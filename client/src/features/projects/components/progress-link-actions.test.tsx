import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ProjectMemberResponse } from '@broodsilk/shared';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { ProgressLinkActions } from './progress-link-actions';

afterEach(() => vi.unstubAllGlobals());

const member: ProjectMemberResponse = { id: 'm1', role: 'partner', name: 'Aurelia Outside', email: null, userId: null, hasAccount: false };
const PATH = '/api/projects/p1/members/m1/progress-links';

describe('the owner’s progress-link actions on an outside party', () => {
  it('sends a link after asking once, shows its address once, and revokes it', async () => {
    const stub = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 'c' } }),
      [`POST ${PATH}`]: () => ({ status: 201, body: { url: 'https://broodsilk.example/progress/abc' } }),
      [`DELETE ${PATH}`]: () => ({ status: 204 }),
    });
    vi.stubGlobal('fetch', stub.fetchStub);
    const user = userEvent.setup();
    renderWithProviders(<ProgressLinkActions projectId="p1" member={member} />);
    await user.click(screen.getByRole('button', { name: 'Send progress link' }));
    const ask = await screen.findByRole('dialog');
    expect(within(ask).getByText(/Any earlier link of theirs stops working/)).toBeInTheDocument();
    await user.click(within(ask).getByRole('button', { name: 'Send progress link' }));
    expect(await screen.findByText('https://broodsilk.example/progress/abc')).toBeInTheDocument();
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(screen.getByText(/it is shown only once/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'New link' })).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Revoke' }));
    const confirm = await screen.findByRole('dialog');
    await user.click(within(confirm).getByRole('button', { name: 'Revoke' }));
    expect(await screen.findByText('Revoked: the page no longer opens.')).toBeInTheDocument();
    expect(screen.queryByText('https://broodsilk.example/progress/abc')).not.toBeInTheDocument();
    expect(stub.calls.filter((c) => c.path === PATH).map((c) => c.method)).toEqual(['POST', 'DELETE']);
  });

  it('shows the server’s refusal in the dialog', async () => {
    const stub = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 'c' } }),
      [`POST ${PATH}`]: () => ({ status: 409, body: { statusCode: 409, error: 'Conflict', message: 'Aurelia Outside has a Broodsilk account.' } }),
    });
    vi.stubGlobal('fetch', stub.fetchStub);
    const user = userEvent.setup();
    renderWithProviders(<ProgressLinkActions projectId="p1" member={member} />);
    await user.click(screen.getByRole('button', { name: 'Send progress link' }));
    const ask = await screen.findByRole('dialog');
    await user.click(within(ask).getByRole('button', { name: 'Send progress link' }));
    expect(await within(ask).findByRole('alert')).toHaveTextContent('Aurelia Outside has a Broodsilk account.');
  });
});

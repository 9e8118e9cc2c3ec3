import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { i18next } from '@/lib/i18n';
import { invitationPreview as preview } from './invitation-fixtures.test-data';
import { InvitationCard } from './invitation-card';

afterEach(() => vi.unstubAllGlobals());

describe('InvitationCard', () => {
  it('sends a visitor to sign in with the invitation kept as the next page', () => {
    vi.stubGlobal('fetch', stubFetch({}).fetchStub);
    renderWithProviders(
      <InvitationCard
        token="tok"
        preview={preview}
        signedInAs={null}
        signInHref="/sign-in?next=%2Finvitations%2Ftok"
        registerHref="/register"
        onJoined={vi.fn()}
      />,
    );
    expect(screen.getByTestId('invitation')).toHaveTextContent('Mira invites you to the project Regalis 2027 as a partner');
    expect(screen.getByRole('link', { name: 'Sign in to join' })).toHaveAttribute('href', '/sign-in?next=%2Finvitations%2Ftok');
    expect(screen.queryByRole('button', { name: 'Join the project' })).not.toBeInTheDocument();
  });

  it('joins for a signed-in user and hands back the project', async () => {
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/invitations/tok/accept': () => ({ status: 200, body: { projectId: 'p1', role: 'partner', status: 'joined' } }),
    });
    vi.stubGlobal('fetch', fetchStub);
    const onJoined = vi.fn();
    renderWithProviders(
      <InvitationCard token="tok" preview={preview} signedInAs="Tomasz" signInHref="/sign-in" registerHref="/register" onJoined={onJoined} />,
    );
    await userEvent.click(screen.getByRole('button', { name: 'Join the project' }));
    await waitFor(() => expect(onJoined).toHaveBeenCalledWith({ projectId: 'p1', role: 'partner', status: 'joined' }));
    expect(calls.filter((c) => c.method === 'POST').map((c) => c.path)).toEqual(['/api/invitations/tok/accept']);
  });

  it('says the owner must approve when the signed-in account is not the invited address', async () => {
    const { fetchStub } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/invitations/tok/accept': () => ({ status: 200, body: { projectId: 'p1', role: 'partner', status: 'awaiting-owner' } }),
    });
    vi.stubGlobal('fetch', fetchStub);
    const onJoined = vi.fn();
    renderWithProviders(
      <InvitationCard token="tok" preview={preview} signedInAs="Tomasz" signInHref="/sign-in" registerHref="/register" onJoined={onJoined} />,
    );
    await userEvent.click(screen.getByRole('button', { name: 'Join the project' }));
    expect(await screen.findByTestId('invitation-waiting')).toHaveTextContent('the project owner must approve your account');
    expect(onJoined).not.toHaveBeenCalled();
  });

  it('shows why an invitation no longer works, without a join button', () => {
    vi.stubGlobal('fetch', stubFetch({}).fetchStub);
    renderWithProviders(
      <InvitationCard
        token="tok"
        preview={{ ...preview, valid: false, problem: 'This invitation was already used.' }}
        signedInAs="Tomasz"
        signInHref="/sign-in"
        registerHref="/register"
        onJoined={vi.fn()}
      />,
    );
    expect(screen.getByText('This invitation was already used.')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Join the project' })).not.toBeInTheDocument();
  });
});

describe('InvitationCard words', () => {
  afterEach(async () => {
    await i18next.changeLanguage('en');
  });

  it('shows the names as typed, angle brackets included', () => {
    vi.stubGlobal('fetch', stubFetch({}).fetchStub);
    renderWithProviders(
      <InvitationCard
        token="tok"
        preview={{ ...preview, inviterName: 'Mira <3', projectTitle: '<b>Regalis</b> 2027', role: 'caretaker' }}
        signedInAs={null}
        signInHref="/sign-in"
        registerHref="/register"
        onJoined={vi.fn()}
      />,
    );
    expect(screen.getByTestId('invitation')).toHaveTextContent(
      'Mira <3 invites you to the project <b>Regalis</b> 2027 as the caretaker (you roll the eggs and keep the care log).',
    );
  });

  it('speaks German to a German reader', async () => {
    vi.stubGlobal('fetch', stubFetch({}).fetchStub);
    await i18next.changeLanguage('de');
    renderWithProviders(<InvitationCard token="tok" preview={preview} signedInAs={null} signInHref="/sign-in" registerHref="/register" onJoined={vi.fn()} />);
    expect(screen.getByTestId('invitation')).toHaveTextContent('Mira lädt dich als Partner zum Projekt Regalis 2027 ein');
    expect(screen.getByRole('link', { name: 'Anmelden und beitreten' })).toBeInTheDocument();
  });
});

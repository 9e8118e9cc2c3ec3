import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { SignInForm } from './sign-in-form';

afterEach(() => vi.unstubAllGlobals());

describe('SignInForm', () => {
  it('shows the server message when the password is wrong', async () => {
    const { fetchStub } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/auth/login': () => ({ status: 401, body: { statusCode: 401, error: 'Unauthorized', message: 'The e-mail or password is not right.' } }),
    });
    vi.stubGlobal('fetch', fetchStub);
    const onSignedIn = vi.fn();
    renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);
    await userEvent.type(screen.getByLabelText(/E-mail/), 'mira@example.test');
    await userEvent.type(screen.getByLabelText(/Password/), 'wrong password');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('The e-mail or password is not right.');
    expect(onSignedIn).not.toHaveBeenCalled();
  });

  it('a right password before the address is confirmed says so and offers to send the e-mail again', async () => {
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/auth/login': () => ({
        status: 403,
        body: { statusCode: 403, error: 'Forbidden', message: 'Confirm your e-mail address first.', reason: 'email-not-confirmed' },
      }),
      'POST /api/auth/confirm-email/resend': () => ({ status: 202, body: { message: 'sent' } }),
    });
    vi.stubGlobal('fetch', fetchStub);
    const onSignedIn = vi.fn();
    renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);
    await userEvent.type(screen.getByLabelText(/E-mail/), 'new@example.test');
    await userEvent.type(screen.getByLabelText(/Password/), 'the right password');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('Confirm your e-mail address first: open the link we sent when you registered.');
    await userEvent.click(screen.getByRole('button', { name: 'Send the e-mail again' }));
    expect(await screen.findByRole('status')).toHaveTextContent('a new link is on its way');
    expect(calls.find((c) => c.path === '/api/auth/confirm-email/resend')?.body).toEqual({ email: 'new@example.test' });
    expect(onSignedIn).not.toHaveBeenCalled();
  });

  it('sends the credentials and reports success', async () => {
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/auth/login': () => ({
        status: 200,
        body: {
          user: {
            id: '1',
            email: 'mira@example.test',
            displayName: 'Mira',
            role: 'keeper',
            timeZone: 'UTC',
            temperatureUnit: 'C',
            secondFactorEnabled: false,
            secondFactorRequired: false,
          },
          accessToken: 'a',
          csrfToken: 'c',
          expiresAt: '',
        },
      }),
    });
    vi.stubGlobal('fetch', fetchStub);
    const onSignedIn = vi.fn();
    renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);
    await userEvent.type(screen.getByLabelText(/E-mail/), 'mira@example.test');
    await userEvent.type(screen.getByLabelText(/Password/), 'right password');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    await waitFor(() => expect(onSignedIn).toHaveBeenCalled());
    expect(calls.find((c) => c.path === '/api/auth/login')?.body).toEqual({ email: 'mira@example.test', password: 'right password' });
  });

  it('with a second factor, asks for the code and sends it with the pending token; only then is the user signed in', async () => {
    const user = {
      id: '1',
      email: 'mira@example.test',
      displayName: 'Mira',
      role: 'keeper',
      timeZone: 'UTC',
      temperatureUnit: 'C',
      secondFactorEnabled: true,
      secondFactorRequired: false,
    };
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/auth/login': () => ({ status: 200, body: { secondFactor: 'totp', pendingToken: 'pending-1', expiresAt: '' } }),
      'POST /api/auth/login/second-factor': () => ({ status: 200, body: { user, accessToken: 'a', csrfToken: 'c', expiresAt: '' } }),
    });
    vi.stubGlobal('fetch', fetchStub);
    const onSignedIn = vi.fn();
    renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);
    await userEvent.type(screen.getByLabelText(/E-mail/), 'mira@example.test');
    await userEvent.type(screen.getByLabelText(/Password/), 'right password');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    await userEvent.type(await screen.findByLabelText(/Code/), '123 456');
    expect(onSignedIn).not.toHaveBeenCalled();
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    await waitFor(() => expect(onSignedIn).toHaveBeenCalled());
    expect(calls.find((c) => c.path === '/api/auth/login/second-factor')?.body).toEqual({ pendingToken: 'pending-1', code: '123 456' });
  });

  it('checks the fields before sending', async () => {
    const { fetchStub, calls } = stubFetch({});
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<SignInForm onSignedIn={vi.fn()} />);
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter your e-mail address.')).toBeInTheDocument();
    expect(calls).toHaveLength(0);
  });
});

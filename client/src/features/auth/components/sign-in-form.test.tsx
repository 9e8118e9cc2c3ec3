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

  it('sends the credentials and reports success', async () => {
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/auth/login': () => ({
        status: 200,
        body: {
          user: { id: '1', email: 'mira@example.test', displayName: 'Mira', role: 'keeper', timeZone: 'UTC', temperatureUnit: 'C' },
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

  it('checks the fields before sending', async () => {
    const { fetchStub, calls } = stubFetch({});
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<SignInForm onSignedIn={vi.fn()} />);
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter your e-mail address.')).toBeInTheDocument();
    expect(calls).toHaveLength(0);
  });
});

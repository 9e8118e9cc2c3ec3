import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { RegisterForm } from './register-form';

afterEach(() => vi.unstubAllGlobals());

describe('RegisterForm', () => {
  it('shows the browser’s time zone before the account is made and sends the one the user picked instead', async () => {
    const browserZone = Intl.DateTimeFormat().resolvedOptions().timeZone;
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/auth/register': () => ({ status: 201, body: { accessToken: 'x' } }),
    });
    vi.stubGlobal('fetch', fetchStub);
    const onRegistered = vi.fn();
    renderWithProviders(<RegisterForm onRegistered={onRegistered} signInHref="/sign-in" />);

    const zone = screen.getAllByLabelText(/^Time zone/)[0];
    expect(zone).toHaveValue(browserZone);
    expect(screen.getByRole('link', { name: 'Sign in' })).toHaveAttribute('href', '/sign-in');

    const paste = async (field: HTMLElement, text: string) => {
      await userEvent.click(field);
      await userEvent.paste(text);
    };
    await paste(screen.getByLabelText(/^Your name/), 'Nadia');
    await paste(screen.getByLabelText(/^E-mail/), 'nadia@example.test');
    await paste(screen.getByLabelText(/^Password/), 'a long enough password');
    await userEvent.clear(zone);
    await paste(zone, 'Auckland');
    // The dropdown stays display:none in jsdom (its transition never runs), so the option is found with hidden: true.
    await userEvent.click(await screen.findByRole('option', { name: 'Pacific/Auckland', hidden: true }));
    await userEvent.click(screen.getByRole('button', { name: 'Create account' }));

    await waitFor(() => expect(onRegistered).toHaveBeenCalled());
    expect(calls.find((c) => c.path === '/api/auth/register')?.body).toMatchObject({ email: 'nadia@example.test', timeZone: 'Pacific/Auckland' });
  }, 20_000);
});

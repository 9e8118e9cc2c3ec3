import { screen } from '@testing-library/react';
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
      'POST /api/auth/register': () => ({ status: 202, body: { message: 'Check your e-mail: we have sent a message to this address with the next step.' } }),
    });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<RegisterForm signInHref="/sign-in" />);

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

    // The answer is the same for a new and a taken address: the form says where the next step is, and nobody is signed in.
    expect(await screen.findByText('Check your e-mail')).toBeInTheDocument();
    expect(screen.getByText(/We have sent a message to nadia@example.test with the next step\. Open the link in it within 24 hours/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Send the e-mail again' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Create account' })).not.toBeInTheDocument();
    const sent = calls.find((c) => c.path === '/api/auth/register')?.body;
    expect(sent).toMatchObject({ email: 'nadia@example.test', timeZone: 'Pacific/Auckland' });
    expect(sent).not.toHaveProperty('invitationToken');
  }, 20_000);

  it('carries the invitation that led here and offers to send the confirmation again', async () => {
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/auth/register': () => ({ status: 202, body: { message: 'Check your e-mail: we have sent a message to this address with the next step.' } }),
      'POST /api/auth/confirm-email/resend': () => ({ status: 202, body: { message: 'sent' } }),
    });
    vi.stubGlobal('fetch', fetchStub);
    const invitationToken = 'i'.repeat(43);
    renderWithProviders(<RegisterForm signInHref="/sign-in" invitationToken={invitationToken} />);
    const paste = async (label: RegExp, text: string) => {
      await userEvent.click(screen.getByLabelText(label));
      await userEvent.paste(text);
    };
    await paste(/^Your name/, 'Ola');
    await paste(/^E-mail/, ' ola@example.test ');
    await paste(/^Password/, 'a long enough password');
    await userEvent.click(screen.getByRole('button', { name: 'Create account' }));
    expect(await screen.findByText('Your invitation is kept: confirming the address also accepts it.')).toBeInTheDocument();
    expect(calls.find((c) => c.path === '/api/auth/register')?.body).toMatchObject({ invitationToken });

    await userEvent.click(screen.getByRole('button', { name: 'Send the e-mail again' }));
    expect(await screen.findByText(/a new link is on its way\. It works once, within 24 hours\./)).toBeInTheDocument();
    expect(calls.find((c) => c.path === '/api/auth/confirm-email/resend')?.body).toEqual({ email: 'ola@example.test' });
  }, 20_000);
});

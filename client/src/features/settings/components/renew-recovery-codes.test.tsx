import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { RenewRecoveryCodes } from './renew-recovery-codes';

afterEach(() => vi.unstubAllGlobals());

describe('RenewRecoveryCodes', () => {
  it('asks for the password or an app code before sending, sends only the one given, and hands the new codes on', async () => {
    const codes = Array.from({ length: 10 }, (_, i) => `code-${i}`);
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/auth/second-factor/recovery-codes': () => ({ status: 200, body: { recoveryCodes: codes } }),
    });
    vi.stubGlobal('fetch', fetchStub);
    const onRenewed = vi.fn();
    renderWithProviders(<RenewRecoveryCodes onRenewed={onRenewed} />);

    await userEvent.click(screen.getByRole('button', { name: 'Make new recovery codes' }));
    await userEvent.click(screen.getByRole('button', { name: 'Make new codes' }));
    expect(await screen.findByText('Enter your password or the code your app shows now.')).toBeInTheDocument();
    expect(calls.some((c) => c.path === '/api/auth/second-factor/recovery-codes')).toBe(false);

    await userEvent.click(screen.getByLabelText(/^Or the code your app shows now/));
    await userEvent.paste(' 123 456 ');
    await userEvent.click(screen.getByRole('button', { name: 'Make new codes' }));
    await vi.waitFor(() => expect(onRenewed).toHaveBeenCalledWith(codes));
    expect(calls.find((c) => c.path === '/api/auth/second-factor/recovery-codes')?.body).toEqual({ code: '123 456' });
  }, 20_000);
});

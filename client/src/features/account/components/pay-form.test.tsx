import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { i18next } from '@/lib/i18n';
import { PayForm } from './pay-form';
import { MIRA, PROJECT_ID } from './account.fixtures';

afterEach(async () => {
  vi.unstubAllGlobals();
  await i18next.changeLanguage('en');
});

describe('PayForm', { timeout: 30_000 }, () => {
  it('refuses more than is owed, then sends the browser to the checkout page for the amount', async () => {
    const url = 'http://127.0.0.1:12190/pay/cs_test_1';
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      [`POST /api/projects/${PROJECT_ID}/settlements/checkout`]: () => ({
        status: 201,
        body: { sessionId: 'cs_test_1', url, amountMinor: 750, currency: 'EUR' },
      }),
    });
    vi.stubGlobal('fetch', fetchStub);
    const goTo = vi.fn();
    renderWithProviders(<PayForm projectId={PROJECT_ID} toMemberId={MIRA.memberId} toName="Mira" owedMinor={1200} currency="EUR" goTo={goTo} />);
    const amount = screen.getByLabelText(/^Amount/);
    expect(amount).toHaveValue('12');
    await userEvent.clear(amount);
    await userEvent.type(amount, '13');
    await userEvent.click(screen.getByRole('button', { name: 'Pay what you owe' }));
    await waitFor(() => expect(amount).toHaveAccessibleDescription('You owe Mira €12.00; the amount cannot be more than that.'));
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);

    await userEvent.clear(amount);
    await userEvent.type(amount, '7.5');
    await userEvent.click(screen.getByRole('button', { name: 'Pay what you owe' }));
    await waitFor(() => expect(goTo).toHaveBeenCalledWith(url));
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ toMemberId: MIRA.memberId, amountMinor: 750 });
  });

  it('refuses a typed amount in the German reader’s words, with the decimal comma in the example', async () => {
    await i18next.changeLanguage('de');
    vi.stubGlobal('fetch', stubFetch({}).fetchStub);
    renderWithProviders(<PayForm projectId={PROJECT_ID} toMemberId={MIRA.memberId} toName="Mira" owedMinor={1200} currency="EUR" goTo={vi.fn()} />);
    const amount = screen.getByRole('textbox');
    const submit = screen.getByRole('button', { name: 'Offenen Betrag bezahlen' });
    await userEvent.clear(amount);
    await userEvent.type(amount, '7,555');
    await userEvent.click(submit);
    // EUR has 2 decimal places: ISO 4217 minor unit, as Intl.NumberFormat resolves it
    await waitFor(() => expect(amount).toHaveAccessibleDescription('EUR hat 2 Nachkommastellen; gib höchstens 2 an.'));
    await userEvent.clear(amount);
    await userEvent.type(amount, 'sieben');
    await userEvent.click(submit);
    // German decimal comma: CLDR de, as Intl.NumberFormat('de') writes 12.5
    await waitFor(() => expect(amount).toHaveAccessibleDescription('Gib den Betrag als einfache Zahl an, etwa 12,5.'));
  });
});

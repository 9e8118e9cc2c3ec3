import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { wordsFor } from '@broodsilk/shared';
import { i18next } from '@/lib/i18n';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { HandOverForm } from './hand-over-form';
import { CAUTION_LAW, CAUTION_OVERNIGHT, handOverForm, PROJECT_ID, shares, TOMASZ } from './account.fixtures';

afterEach(async () => {
  vi.unstubAllGlobals();
  await i18next.changeLanguage('en');
});

const OVER = 'Tomasz: This is 4 more than the 5 young still owed to this party (share 8; 3 handed over, 0 sold, 0 cashed out).';

describe('HandOverForm', { timeout: 30_000 }, () => {
  it('shows the shipping cautions only for a shipment, and a 409 about the count next to the count', async () => {
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      [`GET /api/projects/${PROJECT_ID}/entries/hand-over-form`]: () => ({ status: 200, body: handOverForm() }),
      [`POST /api/projects/${PROJECT_ID}/entries`]: () => ({ status: 409, body: { statusCode: 409, error: 'Conflict', message: OVER } }),
    });
    vi.stubGlobal('fetch', fetchStub);
    const onDone = vi.fn();
    renderWithProviders(<HandOverForm projectId={PROJECT_ID} today="2026-12-01" sacs={shares().sacs} onDone={onDone} />);

    await screen.findByRole('form', { name: 'Record a hand-over' });
    expect(screen.queryByText(CAUTION_OVERNIGHT)).not.toBeInTheDocument();
    await userEvent.click(screen.getByRole('radio', { name: 'Shipment' }));
    expect(await screen.findByText(CAUTION_OVERNIGHT)).toBeInTheDocument();
    expect(screen.getByText(CAUTION_LAW)).toBeInTheDocument();
    await userEvent.click(screen.getByRole('radio', { name: 'Pick-up' }));
    await waitFor(() => expect(screen.queryByText(CAUTION_OVERNIGHT)).not.toBeInTheDocument());
    await userEvent.click(screen.getByRole('radio', { name: 'Shipment' }));

    await userEvent.selectOptions(screen.getByLabelText(/^To/), TOMASZ.memberId);
    await userEvent.type(screen.getByLabelText(/^Count/), '9');
    await userEvent.type(screen.getByLabelText(/^Carrier/), 'Overnight Express');
    await userEvent.click(screen.getByRole('button', { name: 'Record hand-over' }));

    const count = screen.getByLabelText(/^Count/);
    await waitFor(() => expect(count).toHaveAccessibleDescription(OVER));
    expect(count).toHaveAttribute('aria-invalid', 'true');
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
    expect(onDone).not.toHaveBeenCalled();
    const sent = calls.find((c) => c.method === 'POST' && c.path.endsWith('/entries'))?.body;
    expect(sent).toEqual({ kind: 'hand-over', memberId: TOMASZ.memberId, count: 9, date: '2026-12-01', method: 'shipment', carrier: 'Overnight Express' });
  });

  it('sends nothing without a party and a count', async () => {
    const { fetchStub, calls } = stubFetch({ [`GET /api/projects/${PROJECT_ID}/entries/hand-over-form`]: () => ({ status: 200, body: handOverForm() }) });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<HandOverForm projectId={PROJECT_ID} today="2026-12-01" sacs={shares().sacs} />);
    await userEvent.click(await screen.findByRole('button', { name: 'Record hand-over' }));
    await waitFor(() => expect(screen.getByLabelText(/^To/)).toHaveAccessibleDescription('Who receives the spiderlings?'));
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  });

  it('speaks German to a German reader: the terms name the stage and who pays shipping, the cautions come from the catalogue', async () => {
    await i18next.changeLanguage('de');
    const de = wordsFor('de');
    const { fetchStub } = stubFetch({ [`GET /api/projects/${PROJECT_ID}/entries/hand-over-form`]: () => ({ status: 200, body: handOverForm() }) });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<HandOverForm projectId={PROJECT_ID} today="2026-12-01" sacs={shares().sacs} />);
    await screen.findByRole('form', { name: 'Übergabe erfassen' });
    expect(screen.getByText('Laut den Bedingungen werden die Jungtiere im Stadium 2. Instar übergeben; Versand: Empfänger zahlt.')).toBeInTheDocument();
    expect(screen.getByRole('option', { name: 'Tomasz (noch 5 Jungtiere geschuldet)' })).toBeInTheDocument();
    await userEvent.click(screen.getByRole('radio', { name: 'Versand' }));
    expect(await screen.findByText(de('safety.shipping.overnight'))).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Übergabe speichern' }));
    await waitFor(() => expect(screen.getByRole('combobox', { name: /^An/ })).toHaveAccessibleDescription('Wer bekommt die Jungtiere?'));
  });
});

import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { wordsFor, type FailureNoticePreview } from '@broodsilk/shared';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { FailureForm, failureRequest } from './failure-form';

// The bad-news composer (docs/product.md, Partner updates): the keeper's words go with the facts,
// kept exactly as typed; the preview is the server's own text.
afterEach(() => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

const t = wordsFor('en');
const MESSAGE = '  Sorry — the sac went mouldy.  ';

describe('FailureForm', { timeout: 30_000 }, () => {
  it('sends the message only when one is written, exactly as typed', () => {
    expect(failureRequest({ reason: 'spoiled', message: '   ' })).toEqual({ failureReason: 'spoiled' });
    expect(failureRequest({ reason: 'spoiled', message: MESSAGE })).toEqual({ failureReason: 'spoiled', partnerMessage: MESSAGE });
  });

  it('asks for a reason, shows what the partners will read, then records the failure with the message', async () => {
    const preview: FailureNoticePreview = {
      title: 'Pair: Sac failed',
      body: 'The sac laid 2026-01-02 failed.\n\nA message from Mira:\n“Sorry”',
      members: 2,
      outsideParties: 1,
    };
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/sacs/s1/failure-notice-preview': () => ({ status: 200, body: preview }),
      'PATCH /api/sacs/s1': () => ({ status: 200, body: {} }),
    });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<FailureForm sacId="s1" />);
    const form = screen.getByRole('form', { name: t('page.failureNotice.reasonLabel') });
    await userEvent.click(within(form).getByRole('button', { name: t('page.failureNotice.preview') }));
    expect(await within(form).findByText(t('page.failureNotice.reasonRequired'))).toBeInTheDocument();
    expect(calls.filter((c) => c.method !== 'GET')).toHaveLength(0);

    await userEvent.click(within(form).getByRole('combobox', { name: t('page.failureNotice.reasonLabel') }));
    await userEvent.click(await screen.findByRole('option', { name: t('sacFailure.spoiled'), hidden: true }));
    await userEvent.type(within(form).getByLabelText(t('page.failureNotice.messageLabel')), 'Sorry');
    await userEvent.click(within(form).getByRole('button', { name: t('page.failureNotice.preview') }));
    const shown = await screen.findByTestId('failure-notice-preview');
    expect(shown).toHaveTextContent('Pair: Sac failed');
    expect(shown).toHaveTextContent('A message from Mira:');
    expect(shown).toHaveTextContent(t('page.failureNotice.membersWill', { count: 2 }));
    expect(shown).toHaveTextContent(t('page.failureNotice.outsideWill', { count: 1 }));

    await userEvent.click(within(form).getByRole('button', { name: t('page.failureNotice.submit') }));
    await waitFor(() => expect(calls.filter((c) => c.method === 'PATCH')).toHaveLength(1));
    expect(calls.find((c) => c.method === 'PATCH')?.body).toEqual({ outcome: 'failed', failureReason: 'spoiled', partnerMessage: 'Sorry' });
  });
});

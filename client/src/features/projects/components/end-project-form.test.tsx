import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { wordsFor } from '@broodsilk/shared';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { EndProjectForm } from './end-project-form';

// Product rule (docs/product.md, Attempts, males and the end of a project): the current setback pre-fills the reason.
afterEach(() => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

describe('EndProjectForm', { timeout: 30_000 }, () => {
  it('starts from the setback the facts show', async () => {
    renderWithProviders(<EndProjectForm projectId="p1" setback="sac-eaten" />);
    await userEvent.click(screen.getByRole('button', { name: 'End this project early' }));
    expect(screen.getByLabelText('Reason', { selector: 'input' })).toHaveValue('The sac was eaten');
  });

  it('asks for a reason when there is no setback', async () => {
    renderWithProviders(<EndProjectForm projectId="p1" />);
    await userEvent.click(screen.getByRole('button', { name: 'End this project early' }));
    expect(screen.getByLabelText('Reason', { selector: 'input' })).toHaveValue('');
  });

  it('sends the keeper’s message to the partners with the end, exactly as typed (docs/product.md, Partner updates)', async () => {
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/projects/p1/end': () => ({ status: 200, body: {} }),
    });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<EndProjectForm projectId="p1" setback="sac-eaten" />);
    await userEvent.click(screen.getByRole('button', { name: 'End this project early' }));
    await userEvent.type(screen.getByLabelText(wordsFor('en')('page.failureNotice.messageLabel')), 'She ate it; we try again in May.');
    await userEvent.click(screen.getByRole('button', { name: 'End project' }));
    await waitFor(() => expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1));
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ reason: 'sac-eaten', note: null, partnerMessage: 'She ate it; we try again in May.' });
  });
});

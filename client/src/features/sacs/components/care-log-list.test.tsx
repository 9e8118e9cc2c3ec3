import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { CareLogEntryResponse, KeysetPage } from '@broodsilk/shared';
import { renderWithProviders } from '@/testing/render';
import { testCareLogEntry } from '@/testing/care-log-entry';
import { CareLogList } from './care-log-list';

afterEach(() => vi.unstubAllGlobals());

const note = (id: string, at: string, text: string) => testCareLogEntry({ id, kind: 'note', at, text });

/** The server's pages: newest first, the second after the first page's cursor. */
const PAGES: Record<string, KeysetPage<CareLogEntryResponse>> = {
  first: { items: [note('e3', '2026-12-02T10:00:00Z', 'third'), note('e2', '2026-12-02T09:00:00Z', 'second')], nextCursor: 'cursor-1' },
  'cursor-1': { items: [note('e1', '2026-12-01T09:00:00Z', 'first')], nextCursor: null },
};

// A loaded machine renders these slowly; nothing here is timed.
describe('CareLogList', { timeout: 30_000 }, () => {
  it('shows the first page, then the older page after "Show older entries", asking with the cursor', async () => {
    const asked: (string | null)[] = [];
    vi.stubGlobal('fetch', async (input: RequestInfo | URL) => {
      const url = new URL(typeof input === 'string' ? input : input.toString(), 'http://localhost');
      expect(url.pathname).toBe('/api/sacs/s1/log');
      asked.push(url.searchParams.get('after'));
      const page = PAGES[url.searchParams.get('after') ?? 'first'];
      return new Response(JSON.stringify(page), { status: 200, headers: { 'content-type': 'application/json' } });
    });
    renderWithProviders(<CareLogList sacId="s1" timeZone="Europe/Berlin" temperatureUnit="C" canStrike={false} />);
    const table = await screen.findByTestId('care-log');
    expect(
      within(table)
        .getAllByRole('row')
        .slice(1)
        .map((r) => within(r).getByText(/first|second|third/).textContent),
    ).toEqual(['third', 'second']);
    await userEvent.click(screen.getByRole('button', { name: 'Show older entries' }));
    await waitFor(() => expect(within(screen.getByTestId('care-log')).getAllByRole('row')).toHaveLength(4));
    expect(
      within(screen.getByTestId('care-log'))
        .getAllByRole('row')
        .slice(1)
        .map((r) => within(r).getByText(/first|second|third/).textContent),
    ).toEqual(['third', 'second', 'first']);
    expect(asked).toEqual([null, 'cursor-1']);
    expect(screen.queryByRole('button', { name: 'Show older entries' })).toBeNull();
  });
});

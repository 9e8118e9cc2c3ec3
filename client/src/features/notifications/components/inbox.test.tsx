import { fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { NotificationPage } from '@broodsilk/shared';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { UNREAD_REFRESH_MS } from '../api/notifications';
import { InboxLink } from './inbox-link';
import { NotificationList } from './notification-list';

const page = (unread: number): NotificationPage => ({
  items: [
    {
      id: 'n1',
      kind: 'roll-due',
      title: 'Roll due: Spring pair',
      body: 'The sac laid 2026-11-01 is due for its next roll.',
      subject: { type: 'sac', id: 's1' },
      projectId: 'p1',
      createdAt: '2026-12-01T07:00:00Z',
      readAt: null,
    },
  ],
  total: 1,
  unread,
});

afterEach(() => {
  vi.useRealTimers();
  vi.unstubAllGlobals();
});

describe('inbox', () => {
  it('the shell’s unread count refreshes by itself', async () => {
    vi.useFakeTimers({ shouldAdvanceTime: true });
    let unread = 2;
    vi.stubGlobal('fetch', stubFetch({ 'GET /api/notifications': () => ({ status: 200, body: page(unread) }) }).fetchStub);
    renderWithProviders(<InboxLink />);
    expect(await screen.findByRole('link', { name: 'Inbox, 2 unread' })).toHaveAttribute('href', '/notifications');
    unread = 3;
    await vi.advanceTimersByTimeAsync(UNREAD_REFRESH_MS + 100);
    expect(await screen.findByRole('link', { name: 'Inbox, 3 unread' })).toBeInTheDocument();
  });

  it('each notification links to its subject; following it marks it read', async () => {
    const { fetchStub, calls } = stubFetch({
      'GET /api/notifications': () => ({ status: 200, body: page(1) }),
      'POST /api/notifications/n1/read': () => ({ status: 200, body: { ...page(0).items[0], readAt: '2026-12-01T08:00:00Z' } }),
    });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<NotificationList page={1} onPage={() => undefined} timeZone="Europe/Berlin" />);
    const link = await screen.findByRole('link', { name: 'Roll due: Spring pair' });
    expect(link).toHaveAttribute('href', '/sacs/s1');
    expect(screen.getByText(/1 unread/)).toBeInTheDocument();
    // A date inside the stored sentence reads as the interface writes dates, not as its ISO 8601 value.
    expect(screen.getByText('The sac laid 1 Nov 2026 is due for its next roll.')).toBeInTheDocument();
    fireEvent.click(link);
    await waitFor(() => expect(calls.some((c) => c.method === 'POST' && c.path === '/api/notifications/n1/read')).toBe(true));
  });
});

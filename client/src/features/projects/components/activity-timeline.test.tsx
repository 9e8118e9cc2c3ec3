import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { ActivityEventResponse } from '@broodsilk/shared';
import { renderWithProviders } from '@/testing/render';
import { ActivityTimeline } from './activity-timeline';

function rolls(n: number): ActivityEventResponse[] {
  return Array.from({ length: n }, (_, i) => ({
    id: `e${i}`,
    projectId: 'p',
    projectTitle: 'Test project',
    actor: { id: 'u', name: 'Ines' },
    kind: 'care.roll',
    subject: { type: 'sac', id: 's' },
    summary: `Roll number ${i + 1}`,
    data: {},
    // One roll every 12 hours, oldest first, so the newest must come out on top.
    at: new Date(Date.UTC(2026, 10, 1) + i * 12 * 3600_000).toISOString(),
  }));
}

describe('ActivityTimeline', () => {
  it('shows the newest 15 events first and the rest on request', async () => {
    renderWithProviders(<ActivityTimeline events={rolls(20)} timeZone="UTC" />);
    const items = screen.getAllByText(/^Roll number/);
    expect(items).toHaveLength(15);
    expect(items[0]).toHaveTextContent('Roll number 20');
    expect(screen.queryByText('Roll number 5')).not.toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Show all 20 events' }));
    expect(screen.getAllByText(/^Roll number/)).toHaveLength(20);
  });

  it('says so when nothing has happened', () => {
    renderWithProviders(<ActivityTimeline events={[]} timeZone="UTC" />);
    expect(screen.getByText('Nothing has happened yet.')).toBeInTheDocument();
  });
});

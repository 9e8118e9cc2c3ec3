import { Text } from '@mantine/core';
import type { DashboardResponse, PullWindowEvent } from '@broodsilk/shared';
import { SectionCard } from '@/components/ui/section-card';
import { SacLine } from './sac-line';

const EVENT: Record<PullWindowEvent, { label: string; tone: string }> = {
  'opens-today': { label: 'Opens today', tone: 'tone-due' },
  open: { label: 'Open now', tone: 'tone-ok' },
  'closes-today': { label: 'Closes today', tone: 'tone-failed' },
};

/** Sacs with the mother whose pull window is open: opening today, closing today, or open now. */
export function PullTodayCard({ pullWindows }: { pullWindows: DashboardResponse['dueToday']['pullWindows'] }) {
  return (
    <SectionCard
      compact
      title="Pull windows open"
      testId="card-pull-today"
      accent={pullWindows.some((p) => p.event === 'closes-today') ? 'clay' : pullWindows.length ? 'amber' : undefined}
    >
      {pullWindows.length === 0 ? (
        <Text size="sm" c="dimmed">
          No pull window is open today.
        </Text>
      ) : (
        pullWindows.map((p) => (
          <SacLine
            key={`${p.sac.id}-${p.event}`}
            item={p}
            right={
              <Text size="sm" fw={700} className={EVENT[p.event].tone} data-testid="pull-event">
                {EVENT[p.event].label}
              </Text>
            }
          />
        ))
      )}
    </SectionCard>
  );
}

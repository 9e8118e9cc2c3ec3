import { Text } from '@mantine/core';
import type { DashboardResponse, PullWindowEvent } from '@broodsilk/shared';
import { SectionCard } from '@/components/ui/section-card';
import { SacLine } from './sac-line';
import { useWords } from '@/lib/i18n';

const EVENT_TONE: Record<PullWindowEvent, string> = { 'opens-today': 'tone-due', open: 'tone-ok', 'closes-today': 'tone-failed' };

/** Sacs with the mother whose pull window is open: opening today, closing today, or open now. */
export function PullTodayCard({ pullWindows }: { pullWindows: DashboardResponse['dueToday']['pullWindows'] }) {
  const t = useWords();
  return (
    <SectionCard
      compact
      title={t('page.dashboard.pull.title')}
      testId="card-pull-today"
      accent={pullWindows.some((p) => p.event === 'closes-today') ? 'clay' : pullWindows.length ? 'amber' : undefined}
    >
      {pullWindows.length === 0 ? (
        <Text size="sm" c="dimmed">
          {t('page.dashboard.pull.none')}
        </Text>
      ) : (
        pullWindows.map((p) => (
          <SacLine
            key={`${p.sac.id}-${p.event}`}
            item={p}
            right={
              <Text size="sm" fw={700} className={EVENT_TONE[p.event]} data-testid="pull-event">
                {t(`pullWindowEvent.${p.event}`)}
              </Text>
            }
          />
        ))
      )}
    </SectionCard>
  );
}

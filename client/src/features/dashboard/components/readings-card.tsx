import { Text } from '@mantine/core';
import type { DashboardResponse, TemperatureUnit } from '@broodsilk/shared';
import { SectionCard } from '@/components/ui/section-card';
import { SacLine } from './sac-line';
import { useWords } from '@/lib/i18n';
import { readingAlertText } from '@/lib/band';

/** Sacs whose latest temperature or humidity lies outside their band; shown only when there are some. */
export function ReadingsCard({ readings, temperatureUnit }: { readings: DashboardResponse['dueToday']['readings']; temperatureUnit: TemperatureUnit }) {
  const t = useWords();
  if (readings.length === 0) return null;
  return (
    <SectionCard compact title={t('page.dashboard.readings.title')} testId="card-readings" accent="clay">
      {readings.map((r) => (
        <SacLine
          key={r.sac.id}
          item={r}
          right={r.sac.readingAlerts.map((a) => (
            <Text key={a.kind} size="sm" fw={700} className="tone-failed" data-testid="reading-alert">
              {readingAlertText(a, r.sac.band, temperatureUnit)}
            </Text>
          ))}
        />
      ))}
    </SectionCard>
  );
}

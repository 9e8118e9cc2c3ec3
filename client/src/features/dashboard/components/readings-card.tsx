import { Text } from '@mantine/core';
import { readingAlertWords, type DashboardResponse, type TemperatureUnit } from '@broodsilk/shared';
import { SectionCard } from '@/components/ui/section-card';
import { SacLine } from './sac-line';

/** Sacs whose latest temperature or humidity lies outside their band; shown only when there are some. */
export function ReadingsCard({ readings, temperatureUnit }: { readings: DashboardResponse['dueToday']['readings']; temperatureUnit: TemperatureUnit }) {
  if (readings.length === 0) return null;
  return (
    <SectionCard compact title="Readings outside the band" testId="card-readings" accent="clay">
      {readings.map((r) => (
        <SacLine
          key={r.sac.id}
          item={r}
          right={r.sac.readingAlerts.map((a) => (
            <Text key={a.kind} size="sm" fw={700} className="tone-failed" data-testid="reading-alert">
              {readingAlertWords(a, r.sac.band, temperatureUnit)}
            </Text>
          ))}
        />
      ))}
    </SectionCard>
  );
}

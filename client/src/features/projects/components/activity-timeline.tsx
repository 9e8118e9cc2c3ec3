import { Text, Timeline } from '@mantine/core';
import type { ActivityEventResponse } from '@broodsilk/shared';
import { formatInstant } from '@/lib/dates';

/** A project's life, newest first: one line per recorded event. */
export function ActivityTimeline({ events, timeZone, showProject = false }: { events: ActivityEventResponse[]; timeZone: string; showProject?: boolean }) {
  if (events.length === 0) return <Text c="dimmed">Nothing has happened yet.</Text>;
  const sorted = [...events].sort((a, b) => (a.at < b.at ? 1 : -1));
  return (
    <Timeline bulletSize={12} lineWidth={2} data-testid="activity-timeline">
      {sorted.map((e) => (
        <Timeline.Item key={e.id} color={e.kind.includes('fail') || e.kind.includes('end') ? 'clay' : 'moss'}>
          <Text size="sm">{e.summary}</Text>
          <Text size="xs" c="dimmed">
            {e.actor?.name ?? 'Broodsilk'} · {formatInstant(e.at, timeZone)}
            {showProject && ` · ${e.projectTitle}`}
          </Text>
        </Timeline.Item>
      ))}
    </Timeline>
  );
}

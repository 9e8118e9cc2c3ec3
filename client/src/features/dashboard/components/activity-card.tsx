import { Anchor, Stack, Text } from '@mantine/core';
import { Link } from 'react-router';
import type { ActivityEventResponse } from '@broodsilk/shared';
import { paths } from '@/config/paths';
import { formatInstant, withReadableDates } from '@/lib/dates';
import { SectionCard } from '@/components/ui/section-card';

/** What others did lately in the viewer's projects. */
export function ActivityCard({ events, timeZone }: { events: ActivityEventResponse[]; timeZone: string }) {
  return (
    <SectionCard compact title="From your partners" testId="card-activity">
      {events.length === 0 ? (
        <Text size="sm" c="dimmed">
          Nothing new from others.
        </Text>
      ) : (
        <Stack gap={6}>
          {events.slice(0, 8).map((e) => (
            <div key={e.id}>
              <Text size="sm">
                <b>{e.actor?.name ?? 'Broodsilk'}</b>: {withReadableDates(e.summary)}
              </Text>
              <Text size="xs" c="dimmed">
                <Anchor component={Link} to={paths.project.href(e.projectId)} size="xs">
                  {e.projectTitle}
                </Anchor>{' '}
                · {formatInstant(e.at, timeZone)}
              </Text>
            </div>
          ))}
        </Stack>
      )}
    </SectionCard>
  );
}

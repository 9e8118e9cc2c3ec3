import { Anchor, Stack, Text } from '@mantine/core';
import { Link } from 'react-router';
import type { ActivityEventResponse } from '@broodsilk/shared';
import { paths } from '@/config/paths';
import { formatInstant, withReadableDates } from '@/lib/dates';
import { SectionCard } from '@/components/ui/section-card';
import { useWords } from '@/lib/i18n';

/** What others did lately in the viewer's projects. */
export function ActivityCard({ events, timeZone }: { events: ActivityEventResponse[]; timeZone: string }) {
  const t = useWords();
  return (
    <SectionCard compact title={t('page.dashboard.activity.title')} testId="card-activity">
      {events.length === 0 ? (
        <Text size="sm" c="dimmed">
          {t('page.dashboard.activity.none')}
        </Text>
      ) : (
        <Stack gap={6}>
          {events.slice(0, 8).map((e) => (
            <div key={e.id}>
              <Text size="sm">
                <b>{e.actor?.name ?? t('page.shell.brand')}</b>: {withReadableDates(e.summary)}
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

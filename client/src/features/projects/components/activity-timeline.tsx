import { Button, Text, Timeline } from '@mantine/core';
import { useState } from 'react';
import { activitySentence, type ActivityEventResponse } from '@broodsilk/shared';
import { currentNumbering, currentUnit, useWords } from '@/lib/i18n';
import { formatInstant, withReadableDates } from '@/lib/dates';

/** How many events show before "Show all": a pulled sac logs two rolls a day. */
const FIRST_EVENTS = 15;

/** A project's life, newest first: one line per recorded event. */
export function ActivityTimeline({ events, timeZone, showProject = false }: { events: ActivityEventResponse[]; timeZone: string; showProject?: boolean }) {
  const [all, setAll] = useState(false);
  const t = useWords();
  if (events.length === 0) return <Text c="dimmed">{t('page.projects.timeline.none')}</Text>;
  const sorted = [...events].sort((a, b) => (a.at < b.at ? 1 : -1));
  const shown = all ? sorted : sorted.slice(0, FIRST_EVENTS);
  return (
    <>
      <Timeline bulletSize={12} lineWidth={2} data-testid="activity-timeline">
        {shown.map((e) => (
          <Timeline.Item key={e.id} color={e.kind.includes('fail') || e.kind.includes('end') ? 'clay' : 'moss'}>
            <Text size="sm">{withReadableDates(activitySentence(t, e, { unit: currentUnit(), numbering: currentNumbering() }))}</Text>
            <Text size="xs" c="dimmed">
              {e.actor?.name ?? t('page.shell.brand')} · {formatInstant(e.at, timeZone)}
              {showProject && ` · ${e.projectTitle}`}
            </Text>
          </Timeline.Item>
        ))}
      </Timeline>
      {sorted.length > shown.length && (
        <Button variant="subtle" size="xs" mt="sm" onClick={() => setAll(true)}>
          {t('page.projects.timeline.showAll', { count: sorted.length })}
        </Button>
      )}
    </>
  );
}

import { Alert, Card, Stack, Text, UnstyledButton } from '@mantine/core';
import { useQueries } from '@tanstack/react-query';
import { Link } from 'react-router';
import type { SacResponse, TemperatureUnit } from '@broodsilk/shared';
import { formatInstant } from '@/lib/dates';
import { sacQueries } from '../api/sacs';
import { broodLabel, readingAlertText, ROLL_TEXT } from '../utils/sac-view';
import classes from './incubator-list.module.css';
import { useWords } from '@/lib/i18n';

const URGENCY = { overdue: 0, due: 1, 'due-soon': 2, upcoming: 3 } as const;
/** Sacs no longer rolled come after those that are; checks and readings go on for them. */
const urgency = (sac: SacResponse) => (sac.roll ? URGENCY[sac.roll.status] : 4);

/** Every sac of these projects that sits in an incubator, the most urgent roll first, as big tap targets. */
export function IncubatorList({
  projects,
  timeZone,
  temperatureUnit,
  hrefFor,
}: {
  projects: { id: string; title: string }[];
  timeZone: string;
  temperatureUnit: TemperatureUnit;
  hrefFor: (sacId: string) => string;
}) {
  const t = useWords();
  const results = useQueries({ queries: projects.map((p) => sacQueries.ofProject(p.id)) });
  const failed = results.find((r) => r.isError);
  const pending = results.some((r) => r.isPending);
  const rows: { sac: SacResponse; title: string }[] = results.flatMap((r, i) =>
    (r.data ?? []).filter((s) => s.inIncubator).map((sac) => ({ sac, title: projects[i]!.title })),
  );
  rows.sort((a, b) => urgency(a.sac) - urgency(b.sac) || (a.sac.roll?.due ?? a.sac.layDate).localeCompare(b.sac.roll?.due ?? b.sac.layDate));

  if (failed?.error) return <Alert color="clay">{failed.error.message}</Alert>;
  if (pending && rows.length === 0) return <Text c="dimmed">{t('page.sacs.incubator.looking')}</Text>;
  if (rows.length === 0) return <Text c="dimmed">{t('page.sacs.incubator.none')}</Text>;
  return (
    <Stack gap="sm" data-testid="incubator-list">
      {rows.map(({ sac, title }) => {
        const roll = sac.roll ? ROLL_TEXT[sac.roll.status] : null;
        return (
          <UnstyledButton key={sac.id} component={Link} to={hrefFor(sac.id)} className={classes.row}>
            <Card withBorder padding="md" data-status={sac.roll?.status ?? 'not-rolled'}>
              <Text fw={700} size="lg">
                {title}
              </Text>
              <Text size="sm" c="dimmed">
                {sac.container
                  ? t('page.sacs.incubator.dayStageIn', { day: sac.dayNumber, stage: broodLabel(sac.broodStage), container: sac.container })
                  : t('page.sacs.incubator.dayStage', { day: sac.dayNumber, stage: broodLabel(sac.broodStage) })}
              </Text>
              {roll && sac.roll ? (
                <Text fw={700} className={roll.tone}>
                  {roll.label} · {formatInstant(sac.roll.due, timeZone)}
                </Text>
              ) : (
                <Text size="sm">{t('page.sacs.incubator.noRolls')}</Text>
              )}
              {sac.readingAlerts.map((a) => (
                <Text key={a.kind} size="sm" fw={700} className="tone-failed">
                  {readingAlertText(a, sac.band, temperatureUnit)}
                </Text>
              ))}
            </Card>
          </UnstyledButton>
        );
      })}
    </Stack>
  );
}

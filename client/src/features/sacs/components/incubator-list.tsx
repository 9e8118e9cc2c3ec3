import { Alert, Card, Stack, Text, UnstyledButton } from '@mantine/core';
import { useQueries } from '@tanstack/react-query';
import { Link } from 'react-router';
import type { SacResponse } from '@broodsilk/shared';
import { formatInstant } from '@/lib/dates';
import { sacQueries } from '../api/sacs';
import { ROLL_TEXT } from '../utils/sac-view';
import classes from './incubator-list.module.css';

const URGENCY = { overdue: 0, due: 1, 'due-soon': 2, upcoming: 3 } as const;

/** Every sac of these projects that is being rolled, the most urgent first, as big tap targets. */
export function IncubatorList({
  projects,
  timeZone,
  hrefFor,
}: {
  projects: { id: string; title: string }[];
  timeZone: string;
  hrefFor: (sacId: string) => string;
}) {
  const results = useQueries({ queries: projects.map((p) => sacQueries.ofProject(p.id)) });
  const failed = results.find((r) => r.isError);
  const pending = results.some((r) => r.isPending);
  const rows: { sac: SacResponse; title: string }[] = results.flatMap((r, i) =>
    (r.data ?? []).filter((s) => s.roll).map((sac) => ({ sac, title: projects[i]!.title })),
  );
  rows.sort((a, b) => URGENCY[a.sac.roll!.status] - URGENCY[b.sac.roll!.status] || (a.sac.roll!.due < b.sac.roll!.due ? -1 : 1));

  if (failed?.error) return <Alert color="clay">{failed.error.message}</Alert>;
  if (pending && rows.length === 0) return <Text c="dimmed">Looking for sacs…</Text>;
  if (rows.length === 0) return <Text c="dimmed">No sac is being rolled right now. A sac shows up here once it is pulled.</Text>;
  return (
    <Stack gap="sm" data-testid="incubator-list">
      {rows.map(({ sac, title }) => {
        const t = ROLL_TEXT[sac.roll!.status];
        return (
          <UnstyledButton key={sac.id} component={Link} to={hrefFor(sac.id)} className={classes.row}>
            <Card withBorder padding="md" data-status={sac.roll!.status}>
              <Text fw={700} size="lg">
                {title}
              </Text>
              <Text size="sm" c="dimmed">
                Day {sac.dayNumber}
              </Text>
              <Text fw={700} className={t.tone}>
                {t.label} · {formatInstant(sac.roll!.due, timeZone)}
              </Text>
            </Card>
          </UnstyledButton>
        );
      })}
    </Stack>
  );
}

import { Anchor, Card, Group, SimpleGrid, Stack, Text } from '@mantine/core';
import { Link } from 'react-router';
import { maleClockUrgency, type MaleClockRow } from '@broodsilk/shared';
import type { Words } from '@broodsilk/shared';
import { useWords } from '@/lib/i18n';
import { CLOCK_STATES } from '../utils/animal-view';
import { useMalesByClock } from '../api/animals';
import { ClockBadge } from './clock-badge';

function daysLeftText(t: Words, days: number): string {
  if (days < 0) return t('page.collection.males.daysPast', { count: -days });
  if (days === 0) return t('page.collection.males.endsToday');
  return t('page.collection.males.daysLeft', { count: days });
}

/** Mature males, the one whose time runs out first at the top. */
export function MatureMales({ hrefOf }: { hrefOf: (id: string) => string }) {
  const t = useWords();
  const { data, isPending, isError, error } = useMalesByClock();
  if (isPending) return <Text c="dimmed">{t('page.shell.loadingDots')}</Text>;
  if (isError) return <Text className="tone-failed">{error.message}</Text>;
  if (data.length === 0) return <Text c="dimmed">{t('page.collection.males.none')}</Text>;
  // The server sends them in order; sorting again keeps the promise if it ever does not.
  const rows: MaleClockRow[] = [...data].sort((a, b) => maleClockUrgency(a.clock) - maleClockUrgency(b.clock));
  return (
    <SimpleGrid cols={{ base: 1, sm: 2, lg: 3 }} aria-label={t('page.collection.males.byUrgency')}>
      {rows.map(({ animal, clock }) => (
        <Card key={animal.id} withBorder padding="sm" data-testid="male-card">
          <Stack gap={4}>
            <Group justify="space-between" wrap="nowrap">
              <Anchor component={Link} to={hrefOf(animal.id)} fw={700} style={{ paddingBlock: 8 }}>
                {animal.label}
              </Anchor>
              <ClockBadge clock={clock} />
            </Group>
            <Text size="sm" fs="italic">
              {animal.species.scientificName}
            </Text>
            <Text size="sm" className={CLOCK_STATES[clock.state].tone} data-testid="days-left" data-days={clock.daysUntilPastTypical}>
              {daysLeftText(t, clock.daysUntilPastTypical)}
            </Text>
            <Text size="xs" c="dimmed">
              {clock.nextChange
                ? t('page.collection.males.maturedNext', {
                    date: clock.maturedOn,
                    day: clock.daysSinceMaturing,
                    state: CLOCK_STATES[clock.nextChange.state].label,
                    next: clock.nextChange.on,
                  })
                : t('page.collection.males.matured', { date: clock.maturedOn, day: clock.daysSinceMaturing })}
            </Text>
          </Stack>
        </Card>
      ))}
    </SimpleGrid>
  );
}

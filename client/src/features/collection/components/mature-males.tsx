import { Anchor, Card, Group, SimpleGrid, Stack, Text } from '@mantine/core';
import { Link } from 'react-router';
import { maleClockUrgency, type MaleClockRow } from '@broodsilk/shared';
import { formatDate } from '@/lib/dates';
import { CLOCK_STATES } from '../utils/animal-view';
import { useMalesByClock } from '../api/animals';
import { ClockBadge } from './clock-badge';

function daysLeftText(days: number): string {
  if (days < 0) return `${-days} days past the usual span`;
  if (days === 0) return 'Reaches the end of the usual span today';
  return `${days} days left in the usual span`;
}

/** Mature males, the one whose time runs out first at the top. */
export function MatureMales({ hrefOf }: { hrefOf: (id: string) => string }) {
  const { data, isPending, isError, error } = useMalesByClock();
  if (isPending) return <Text c="dimmed">Loading…</Text>;
  if (isError) return <Text className="tone-failed">{error.message}</Text>;
  if (data.length === 0) return <Text c="dimmed">No mature males with a maturing date yet.</Text>;
  // The server sends them in order; sorting again keeps the promise if it ever does not.
  const rows: MaleClockRow[] = [...data].sort((a, b) => maleClockUrgency(a.clock) - maleClockUrgency(b.clock));
  return (
    <SimpleGrid cols={{ base: 1, sm: 2, lg: 3 }} aria-label="Mature males by urgency">
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
              {daysLeftText(clock.daysUntilPastTypical)}
            </Text>
            <Text size="xs" c="dimmed">
              Matured {formatDate(clock.maturedOn)} · day {clock.daysSinceMaturing}
              {clock.nextChange ? ` · “${CLOCK_STATES[clock.nextChange.state].label}” from ${formatDate(clock.nextChange.on)}` : ''}
            </Text>
          </Stack>
        </Card>
      ))}
    </SimpleGrid>
  );
}

import { Card, SimpleGrid, Stack, Text } from '@mantine/core';
import type { ProjectAnimal } from '@broodsilk/shared';
import { MALE_CLOCK_LABELS } from '@/lib/i18n';
import { formatDate } from '@/lib/dates';
import { MALE_CLOCK_TONE } from '@/lib/tones';

function AnimalLine({ role, animal }: { role: string; animal: ProjectAnimal }) {
  const clock = animal.maleClock;
  return (
    <Card withBorder padding="sm">
      <Stack gap={2}>
        <Text size="xs" c="dimmed" tt="uppercase" fw={600}>
          {role}
        </Text>
        <Text fw={700}>
          {animal.label}{' '}
          <Text span fs="italic" fw={400} size="sm">
            {animal.species.scientificName}
          </Text>
        </Text>
        <Text size="sm" c="dimmed">
          Owner: {animal.owner.name}
          {animal.custody === 'loan-in' && ' · on a breeding loan'}
          {animal.dueBackOn && ` · due back ${formatDate(animal.dueBackOn)}`}
        </Text>
        {clock && (
          <Text size="sm" className={MALE_CLOCK_TONE[clock.state].tone || undefined}>
            Male clock: day {clock.daysSinceMaturing} since maturing, {MALE_CLOCK_LABELS[clock.state].label.toLowerCase()}
          </Text>
        )}
        {animal.lastMoltOn && <Text size="sm">Last molt {formatDate(animal.lastMoltOn)}</Text>}
      </Stack>
    </Card>
  );
}

/** The pair: the female and the male as members see them. */
export function ProjectAnimals({ female, male }: { female: ProjectAnimal; male: ProjectAnimal }) {
  return (
    <SimpleGrid cols={{ base: 1, sm: 2 }}>
      <AnimalLine role="Female" animal={female} />
      <AnimalLine role="Male" animal={male} />
    </SimpleGrid>
  );
}

import { Card, SimpleGrid, Stack, Text } from '@mantine/core';
import type { ProjectAnimal } from '@broodsilk/shared';
import { MALE_CLOCK_LABELS } from '@/lib/i18n';
import { formatDate } from '@/lib/dates';
import { MALE_CLOCK_TONE } from '@/lib/tones';

function AnimalLine({ role, animal }: { role: string; animal: ProjectAnimal }) {
  const clock = animal.status === 'deceased' ? null : animal.maleClock;
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
        {animal.status === 'deceased' && (
          <Text size="sm" className="tone-failed">
            Died{animal.statusOn ? ` ${formatDate(animal.statusOn)}` : ''}
          </Text>
        )}
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

/** The female and every male of the project (the first one, then backups in the order paired), as members see them. */
export function ProjectAnimals({ female, males }: { female: ProjectAnimal; males: ProjectAnimal[] }) {
  return (
    <SimpleGrid cols={{ base: 1, sm: 2 }} data-testid="project-animals">
      <AnimalLine role="Female" animal={female} />
      {males.map((m, i) => (
        <AnimalLine key={m.id} role={i === 0 ? 'Male' : 'Backup male'} animal={m} />
      ))}
    </SimpleGrid>
  );
}

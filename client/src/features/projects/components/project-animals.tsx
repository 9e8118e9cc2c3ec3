import { Card, SimpleGrid, Stack, Text } from '@mantine/core';
import { label, type ProjectAnimal } from '@broodsilk/shared';
import { MALE_CLOCK_LABELS, useWords } from '@/lib/i18n';
import { MALE_CLOCK_TONE } from '@/lib/tones';
import { midSentence } from '../utils/labels';

function AnimalLine({ role, animal }: { role: string; animal: ProjectAnimal }) {
  const t = useWords();
  const clock = animal.status === 'deceased' ? null : animal.maleClock;
  const onLoan = animal.custody === 'loan-in';
  const owner = animal.dueBackOn
    ? t(onLoan ? 'page.projects.animals.ownerOnLoanDueBack' : 'page.projects.animals.ownerDueBack', { name: animal.owner.name, date: animal.dueBackOn })
    : t(onLoan ? 'page.projects.animals.ownerOnLoan' : 'page.projects.animals.owner', { name: animal.owner.name });
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
          {owner}
        </Text>
        {animal.status === 'deceased' && (
          <Text size="sm" className="tone-failed">
            {animal.statusOn ? t('page.projects.animals.diedOn', { date: animal.statusOn }) : t('page.projects.animals.died')}
          </Text>
        )}
        {clock && (
          <Text size="sm" className={MALE_CLOCK_TONE[clock.state].tone || undefined}>
            {t('page.projects.animals.maleClock', { day: clock.daysSinceMaturing, state: midSentence(MALE_CLOCK_LABELS[clock.state].label) })}
          </Text>
        )}
        {animal.lastMoltOn && <Text size="sm">{t('page.projects.animals.lastMolt', { date: animal.lastMoltOn })}</Text>}
      </Stack>
    </Card>
  );
}

/** The female and every male of the project (the first one, then backups in the order paired), as members see them. */
export function ProjectAnimals({ female, males }: { female: ProjectAnimal; males: ProjectAnimal[] }) {
  const t = useWords();
  return (
    <SimpleGrid cols={{ base: 1, sm: 2 }} data-testid="project-animals">
      <AnimalLine role={label(t, 'sex', 'female')} animal={female} />
      {males.map((m, i) => (
        <AnimalLine key={m.id} role={i === 0 ? label(t, 'sex', 'male') : t('page.projects.animals.backupMale')} animal={m} />
      ))}
    </SimpleGrid>
  );
}

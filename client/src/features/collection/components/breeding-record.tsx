import { Anchor, Badge, Group, Stack, Text } from '@mantine/core';
import { Link } from 'react-router';
import { catalogueLabels, currentNumbering, words } from '@/lib/i18n';
import { broodStageLabel } from '@broodsilk/shared';

const PROJECT_STAGE_LABELS = catalogueLabels('projectStage');
const PAIRING_OUTCOME_LABELS = catalogueLabels('pairingOutcome');
const SAC_FATE_LABELS = catalogueLabels('sacFate');
import { SectionCard } from '@/components/ui/section-card';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/dates';
import { useAnimalBreeding } from '../api/animal-season';

/** Every project the animal is in, with its pairings and its sacs and how they turned out. */
export function BreedingRecord({ animalId }: { animalId: string }) {
  const { data: rows = [] } = useAnimalBreeding(animalId);
  return (
    <SectionCard title="Breeding record" testId="breeding-record">
      {rows.length === 0 ? (
        <Text size="sm" c="dimmed">
          Not in any breeding project yet.
        </Text>
      ) : (
        <Stack>
          {rows.map((r) => (
            <Stack key={r.project.id} gap={4}>
              <Group gap="xs">
                <Anchor component={Link} to={paths.project.href(r.project.id)} fw={600}>
                  {r.project.title}
                </Anchor>
                <Badge variant="light" color="gray" tt="none">
                  {PROJECT_STAGE_LABELS[r.stage.stage]}
                </Badge>
              </Group>
              <Text size="sm" c="dimmed">
                {r.role === 'female' ? 'Female' : 'Male'}, with {r.partnerLabel}
              </Text>
              {r.pairings.length === 0 && <Text size="sm">No pairing yet.</Text>}
              {r.pairings.map((p, i) => (
                <Text key={`p${i}`} size="sm">
                  Paired {formatDate(p.on)}: {PAIRING_OUTCOME_LABELS[p.outcome]}
                </Text>
              ))}
              {r.sacs.map((s, i) => (
                <Text key={s.id ?? `s${i}`} size="sm">
                  Sac laid {formatDate(s.layDate)}
                  {s.pulledOn ? `, pulled ${formatDate(s.pulledOn)}` : ', with the mother'}: {SAC_FATE_LABELS[s.fate]}
                  {s.fate === 'developing' && s.broodStage ? ` (${broodStageLabel(words, s.broodStage, currentNumbering())})` : ''}
                </Text>
              ))}
            </Stack>
          ))}
        </Stack>
      )}
    </SectionCard>
  );
}

import { Anchor, Badge, Group, Stack, Text } from '@mantine/core';
import { Link } from 'react-router';
import { catalogueLabels, currentNumbering, useWords } from '@/lib/i18n';
import { broodStageLabel } from '@broodsilk/shared';

const PROJECT_STAGE_LABELS = catalogueLabels('projectStage');
const PAIRING_OUTCOME_LABELS = catalogueLabels('pairingOutcome');
const SAC_FATE_LABELS = catalogueLabels('sacFate');
import { SectionCard } from '@/components/ui/section-card';
import { paths } from '@/config/paths';
import { useAnimalBreeding } from '../api/animal-season';

/** Every project the animal is in, with its pairings and its sacs and how they turned out. */
export function BreedingRecord({ animalId }: { animalId: string }) {
  const t = useWords();
  const { data: rows = [] } = useAnimalBreeding(animalId);
  return (
    <SectionCard title={t('page.collection.breeding.title')} testId="breeding-record">
      {rows.length === 0 ? (
        <Text size="sm" c="dimmed">
          {t('page.collection.breeding.none')}
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
                {t(r.role === 'female' ? 'page.collection.breeding.asFemale' : 'page.collection.breeding.asMale', { partner: r.partnerLabel })}
              </Text>
              {r.pairings.length === 0 && <Text size="sm">{t('page.collection.breeding.noPairing')}</Text>}
              {r.pairings.map((p, i) => (
                <Text key={`p${i}`} size="sm">
                  {t('page.collection.breeding.paired', { date: p.on, outcome: PAIRING_OUTCOME_LABELS[p.outcome] })}
                </Text>
              ))}
              {r.sacs.map((s, i) => (
                <Text key={s.id ?? `s${i}`} size="sm">
                  {t(s.pulledOn ? 'page.collection.breeding.sacPulled' : 'page.collection.breeding.sacWithMother', {
                    laid: s.layDate,
                    pulled: s.pulledOn,
                    fate:
                      s.fate === 'developing' && s.broodStage
                        ? t('page.collection.breeding.fateAtStage', {
                            fate: SAC_FATE_LABELS[s.fate],
                            stage: broodStageLabel(t, s.broodStage, currentNumbering()),
                          })
                        : SAC_FATE_LABELS[s.fate],
                  })}
                </Text>
              ))}
            </Stack>
          ))}
        </Stack>
      )}
    </SectionCard>
  );
}

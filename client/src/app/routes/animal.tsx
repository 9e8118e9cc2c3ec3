import { Anchor, Badge, Breadcrumbs, Button, Drawer, Grid, Group, Stack, Text, Title } from '@mantine/core';
import { useMediaQuery } from '@mantine/hooks';
import { notifications } from '@mantine/notifications';
import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { formatMoney } from '@broodsilk/shared';
import { DocumentTitle } from '@/components/ui/document-title';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/dates';
import { animalQueries, useAnimal } from '@/features/collection/api/animals';
import { moltQueries } from '@/features/collection/api/molts';
import { AnimalForm } from '@/features/collection/components/animal-form';
import { DeleteAnimal } from '@/features/collection/components/delete-animal';
import { MaleClockPanel } from '@/features/collection/components/male-clock-panel';
import { MoltTimeline } from '@/features/collection/components/molt-timeline';
import { PhotoPanel } from '@/features/collection/components/photo-panel';
import { ReadinessPanel } from '@/features/collection/components/readiness-panel';
import { LifeActions } from '@/features/collection/components/life-actions';
import { FeedingLog } from '@/features/collection/components/feeding-log';
import { BreedingRecord } from '@/features/collection/components/breeding-record';
import { CUSTODY_LABELS, MATURITY_LABELS, SEX_LABELS, SEX_SIGNS, STATUS_LABELS } from '@/features/collection/utils/animal-view';
import { speciesQueries, useSpecies } from '@/features/species/api/species';
import { CautionNotice } from '@/features/species/components/caution-notice';
import { SpeciesPicker } from '@/features/species/components/species-picker';
import { preloadPanels } from '../preload';
import { useWords } from '@/lib/i18n';

export const clientLoader =
  (qc: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = params.animalId!;
    const animal = await qc.ensureQueryData(animalQueries.detail(id));
    await preloadPanels(qc.ensureQueryData(moltQueries.list(id)), qc.ensureQueryData(speciesQueries.detail(animal.species.id)));
    return null;
  };

function Fact({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <Group gap="xs" wrap="nowrap" align="flex-start">
      <Text size="sm" c="dimmed" miw={120}>
        {label}
      </Text>
      <Text size="sm">{children}</Text>
    </Group>
  );
}

export function Component() {
  const t = useWords();
  const { animalId } = useParams();
  const id = animalId!;
  const { data: animal } = useAnimal(id);
  const species = useSpecies(animal?.species.id);
  const navigate = useNavigate();
  const phone = useMediaQuery('(max-width: 48em)');
  const [editing, setEditing] = useState(false);
  if (!animal) return null;

  const owner = animal.owner.kind === 'self' ? t('page.collection.animal.ownerYou') : animal.owner.name;
  const custody = animal.custodyParty
    ? t(animal.custody === 'loan-out' ? 'page.collection.animal.heldBy' : 'page.collection.animal.lentFrom', {
        custody: CUSTODY_LABELS[animal.custody],
        party: animal.custodyParty,
      })
    : CUSTODY_LABELS[animal.custody];
  return (
    <Stack>
      <DocumentTitle title={animal.label} />
      <Breadcrumbs>
        <Anchor component={Link} to={paths.collection.href()} size="sm">
          {t('page.collection.title')}
        </Anchor>
        <Text size="sm">{animal.label}</Text>
      </Breadcrumbs>
      <Group justify="space-between" align="flex-start" wrap="wrap">
        <Stack gap={2}>
          <Title order={2}>{animal.label}</Title>
          <Text fs="italic">{animal.species.scientificName}</Text>
          <Group gap={6}>
            <Badge variant="light" color="gray" style={{ textTransform: 'none' }}>
              {SEX_SIGNS[animal.sex]} {SEX_LABELS[animal.sex]}
            </Badge>
            <Badge variant="light" color="gray" style={{ textTransform: 'none' }}>
              {MATURITY_LABELS[animal.maturity]}
            </Badge>
            <Badge variant="light" color={animal.status === 'active' ? 'moss' : 'amber'} style={{ textTransform: 'none' }}>
              {animal.statusOn
                ? t('page.collection.animal.statusSince', { status: STATUS_LABELS[animal.status], date: animal.statusOn })
                : STATUS_LABELS[animal.status]}
            </Badge>
          </Group>
        </Stack>
        {animal.editable && (
          <Group gap="xs">
            <Button variant="light" onClick={() => setEditing(true)} size="md">
              {t('page.collection.animal.edit')}
            </Button>
            <DeleteAnimal
              animalId={animal.id}
              label={animal.label}
              onDeleted={async () => {
                notifications.show({ color: 'moss', message: t('page.collection.animal.deleted', { label: animal.label }) });
                await navigate(paths.collection.href());
              }}
            />
          </Group>
        )}
      </Group>
      {species.data && <CautionNotice species={species.data} />}
      <Grid gap="lg">
        <Grid.Col span={{ base: 12, md: 6 }}>
          <Stack>
            {animal.maleClock && <MaleClockPanel clock={animal.maleClock} />}
            {animal.readiness && <ReadinessPanel readiness={animal.readiness} />}
            <LifeActions animal={animal} />
            <Stack gap={6}>
              <Fact label={t('page.collection.animal.enclosure')}>{animal.enclosure ?? '—'}</Fact>
              <Fact label={t('page.collection.animal.owner')}>{owner}</Fact>
              <Fact label={t('page.collection.animal.custody')}>
                {[custody, animal.dueBackOn && t('page.collection.animal.dueBack', { date: animal.dueBackOn })].filter(Boolean).join(' · ')}
              </Fact>
              <Fact label={t('page.collection.animal.acquired')}>
                {[
                  animal.acquiredOn && formatDate(animal.acquiredOn),
                  animal.acquiredFrom && t('page.collection.animal.acquiredFrom', { from: animal.acquiredFrom }),
                  animal.pricePaidMinor != null && animal.priceCurrency && formatMoney(animal.pricePaidMinor, animal.priceCurrency),
                ]
                  .filter(Boolean)
                  .join(' · ') || '—'}
              </Fact>
              {animal.maturedOn && !animal.maleClock && <Fact label={t('page.collection.animal.matured')}>{formatDate(animal.maturedOn)}</Fact>}
              {animal.notes && <Fact label={t('page.collection.animal.notes')}>{animal.notes}</Fact>}
              {!animal.editable && <Fact label={t('page.collection.animal.recordedBy')}>{animal.recordedBy.name}</Fact>}
            </Stack>
          </Stack>
        </Grid.Col>
        <Grid.Col span={{ base: 12, md: 6 }}>
          <MoltTimeline animalId={animal.id} sex={animal.sex} editable={animal.editable} maturedOn={animal.maturedOn} />
        </Grid.Col>
      </Grid>
      {animal.editable && (
        <Grid gap="lg">
          <Grid.Col span={{ base: 12, md: 6 }}>
            <FeedingLog animalId={animal.id} />
          </Grid.Col>
          <Grid.Col span={{ base: 12, md: 6 }}>
            <BreedingRecord animalId={animal.id} />
          </Grid.Col>
        </Grid>
      )}
      <PhotoPanel animalId={animal.id} photos={animal.photos} editable={animal.editable} label={animal.label} />
      <Drawer
        opened={editing}
        onClose={() => setEditing(false)}
        title={t('page.collection.animal.editTitle', { label: animal.label })}
        position="right"
        size={phone ? '100%' : 'lg'}
      >
        {editing && (
          <AnimalForm
            animal={animal}
            renderSpeciesPicker={(p) => <SpeciesPicker {...p} />}
            onCancel={() => setEditing(false)}
            onSaved={() => {
              setEditing(false);
              notifications.show({ color: 'moss', message: t('page.collection.animal.saved') });
            }}
          />
        )}
      </Drawer>
    </Stack>
  );
}

import { Alert, Anchor, Group } from '@mantine/core';
import type { QueryClient } from '@tanstack/react-query';
import { Link, type LoaderFunctionArgs } from 'react-router';
import type { ProjectResponse } from '@broodsilk/shared';
import { PageLoader } from '@/components/ui/page-loader';
import { DocumentTitle } from '@/components/ui/document-title';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/dates';
import { projectQueries } from '@/features/projects/api/projects';
import { sacQueries } from '@/features/sacs/api/sacs';
import { IncubatorEntry } from '@/features/sacs/components/incubator-entry';
import { preloadPanels } from '../preload';
import { useSacPage } from './use-sac-page';

export const clientLoader =
  (qc: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const sac = await qc.ensureQueryData(sacQueries.detail(params.sacId!));
    await preloadPanels(qc.ensureQueryData(projectQueries.detail(sac.projectId)));
    return null;
  };

/** Species cautions of the pair, in words, for the incubator screen. */
function speciesCautions(project: ProjectResponse | undefined): string[] {
  if (!project) return [];
  const species = [project.femaleAnimal.species, project.maleAnimal.species];
  const out: string[] = [];
  if (species.some((s) => s.urticatingHairs)) out.push('Urticating hairs: keep your face away when opening the container; gloves and eye protection help.');
  if (species.some((s) => s.medicallySignificantVenom))
    out.push('Medically significant venom: work with tools, never bare hands; young ones are fast. Follow local law and licensed practice.');
  return out;
}

export function Component() {
  const { sacId, me, sac, project } = useSacPage();
  if (!me || sac.isPending) return <PageLoader />;
  if (sac.isError) return <Alert color="clay">{sac.error.message}</Alert>;
  return (
    <>
      <DocumentTitle title={`At the incubator: ${project.data?.title ?? `sac laid ${formatDate(sac.data.layDate)}`}`} />
      <Group justify="space-between" mb="xs">
        <Anchor component={Link} to={paths.incubator.href()} size="sm">
          All sacs in the incubator
        </Anchor>
        <Anchor component={Link} to={paths.sac.href(sacId)} size="sm">
          Full care log
        </Anchor>
      </Group>
      <IncubatorEntry
        sac={sac.data}
        timeZone={me.timeZone}
        temperatureUnit={me.temperatureUnit}
        title={project.data?.title}
        speciesCautions={speciesCautions(project.data)}
      />
    </>
  );
}

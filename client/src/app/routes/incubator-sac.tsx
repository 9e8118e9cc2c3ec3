import { Alert, Anchor, Group } from '@mantine/core';
import type { QueryClient } from '@tanstack/react-query';
import { Link, type LoaderFunctionArgs } from 'react-router';
import { safetyText, type ProjectResponse, type Words } from '@broodsilk/shared';
import { PageLoader } from '@/components/ui/page-loader';
import { DocumentTitle } from '@/components/ui/document-title';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/dates';
import { useWords } from '@/lib/i18n';
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

/** Species cautions of the pair, in the reader's words (the catalogue's safety section), for the incubator screen. */
function speciesCautions(t: Words, project: ProjectResponse | undefined): string[] {
  if (!project) return [];
  const species = [project.femaleAnimal.species, project.maleAnimal.species];
  const out: string[] = [];
  if (species.some((s) => s.urticatingHairs)) out.push(safetyText(t, 'urticatingHairs'));
  if (species.some((s) => s.venom === 'medically-significant')) out.push(safetyText(t, 'venom'));
  else if (species.some((s) => s.venom === 'not-known')) out.push(safetyText(t, 'venomNotKnown'));
  return out;
}

export function Component() {
  const t = useWords();
  const { sacId, me, sac, project } = useSacPage();
  if (!me || sac.isPending) return <PageLoader />;
  if (sac.isError) return <Alert color="clay">{sac.error.message}</Alert>;
  return (
    <>
      <DocumentTitle
        title={
          project.data
            ? t('page.sacs.incubator.pageTitle', { title: project.data.title })
            : t('page.sacs.incubator.pageTitleLaid', { date: formatDate(sac.data.layDate) })
        }
      />
      <Group justify="space-between" mb="xs">
        <Anchor component={Link} to={paths.incubator.href()} size="sm">
          {t('page.sacs.incubator.allSacs')}
        </Anchor>
        <Anchor component={Link} to={paths.sac.href(sacId)} size="sm">
          {t('page.sacs.incubator.fullCareLog')}
        </Anchor>
      </Group>
      <IncubatorEntry
        sac={sac.data}
        timeZone={me.timeZone}
        temperatureUnit={me.temperatureUnit}
        title={project.data?.title}
        speciesCautions={speciesCautions(t, project.data)}
      />
    </>
  );
}

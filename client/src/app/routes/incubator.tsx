import { Alert, Stack } from '@mantine/core';
import type { QueryClient } from '@tanstack/react-query';
import { isHandsOn, isProjectOpen, type ProjectSummary } from '@broodsilk/shared';
import { PageHeader } from '@/components/ui/page-header';
import { PageLoader } from '@/components/ui/page-loader';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/me';
import { projectQueries, useProjects } from '@/features/projects/api/projects';
import { sacQueries } from '@/features/sacs/api/sacs';
import { IncubatorList } from '@/features/sacs/components/incubator-list';
import { useWords } from '@/lib/i18n';
import { preloadPanels } from '../preload';

/** Open projects whose sacs this viewer looks after. */
const incubatorProjects = (projects: ProjectSummary[]) => projects.filter((p) => isProjectOpen(p.stage.stage) && isHandsOn(p.myRole));

export const clientLoader = (qc: QueryClient) => async () => {
  const projects = await qc.ensureQueryData(projectQueries.list());
  await preloadPanels(...incubatorProjects(projects).map((p) => qc.ensureQueryData(sacQueries.ofProject(p.id))));
  return null;
};

export function Component() {
  const t = useWords();
  const { data: me } = useMe();
  const projects = useProjects();
  if (!me || projects.isPending) return <PageLoader />;
  if (projects.isError) return <Alert color="clay">{projects.error.message}</Alert>;
  return (
    <Stack maw={520} mx="auto">
      <PageHeader title={t('page.shell.nav.incubator')} description={t('page.sacs.page.incubatorIntro')} />
      <IncubatorList
        projects={incubatorProjects(projects.data)}
        timeZone={me.timeZone}
        temperatureUnit={me.temperatureUnit}
        hrefFor={paths.incubatorSac.href}
      />
    </Stack>
  );
}

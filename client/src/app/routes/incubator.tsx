import { Alert, Stack } from '@mantine/core';
import { isProjectOpen } from '@broodsilk/shared';
import { PageHeader } from '@/components/ui/page-header';
import { PageLoader } from '@/components/ui/page-loader';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/me';
import { useProjects } from '@/features/projects/api/projects';
import { IncubatorList } from '@/features/sacs/components/incubator-list';

export function Component() {
  const { data: me } = useMe();
  const projects = useProjects();
  if (!me || projects.isPending) return <PageLoader />;
  if (projects.isError) return <Alert color="clay">{projects.error.message}</Alert>;
  const open = projects.data.filter((p) => isProjectOpen(p.stage.stage) && p.myRole !== 'partner');
  return (
    <Stack maw={520} mx="auto">
      <PageHeader title="Incubator" description="Tap a sac to log a roll, a reading or a check." />
      <IncubatorList projects={open} timeZone={me.timeZone} hrefFor={paths.incubatorSac.href} />
    </Stack>
  );
}

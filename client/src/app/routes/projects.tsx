import { Alert, Button } from '@mantine/core';
import type { QueryClient } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { PageLoader } from '@/components/ui/page-loader';
import { paths } from '@/config/paths';
import { projectQueries, useProjects } from '@/features/projects/api/projects';
import { ProjectTable } from '@/features/projects/components/project-table';

export const clientLoader = (qc: QueryClient) => async () => {
  await qc.ensureQueryData(projectQueries.list());
  return null;
};

export function Component() {
  const projects = useProjects();
  return (
    <>
      <PageHeader
        title="Projects"
        description="Every pairing you run or take part in, from plan to settled shares."
        actions={
          <Button component={Link} to={paths.newProject.href()}>
            New project
          </Button>
        }
      />
      {projects.isPending ? <PageLoader /> : projects.isError ? <Alert color="clay">{projects.error.message}</Alert> : <ProjectTable projects={projects.data} projectHref={paths.project.href} />}
    </>
  );
}

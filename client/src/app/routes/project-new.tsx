import { Alert, Anchor } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { mayStartProject } from '@broodsilk/shared';
import { Link, useNavigate } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { PageLoader } from '@/components/ui/page-loader';
import { paths } from '@/config/paths';
import { useAnimals } from '@/features/collection/api/animals';
import { ProjectForm } from '@/features/projects/components/project-form';

export function Component() {
  const navigate = useNavigate();
  const females = useAnimals({ sex: 'female', mature: true, limit: 200, sort: 'label' });
  const males = useAnimals({ sex: 'male', mature: true, limit: 200, sort: 'label' });
  if (females.isPending || males.isPending) return <PageLoader />;
  if (females.isError || males.isError) return <Alert color="clay">{(females.error ?? males.error)?.message}</Alert>;
  return (
    <>
      <PageHeader
        title="New project"
        description="One breeding attempt: a female, a male, the partners and the agreed split."
        actions={
          <Anchor component={Link} to={paths.projects.href()} size="sm">
            All projects
          </Anchor>
        }
      />
      <ProjectForm
        females={females.data.items.filter(mayStartProject)}
        males={males.data.items.filter((a) => mayStartProject(a) && a.custody !== 'loan-out')}
        onCreated={({ project, problems }) => {
          for (const p of problems) notifications.show({ color: 'amber', title: 'Not everything was saved', message: p, autoClose: false });
          navigate(paths.project.href(project.id));
        }}
      />
    </>
  );
}

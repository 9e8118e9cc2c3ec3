import { Alert, Anchor } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { mayStartProject } from '@broodsilk/shared';
import { Link, useNavigate } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { PageLoader } from '@/components/ui/page-loader';
import { paths } from '@/config/paths';
import { useAnimals } from '@/features/collection/api/animals';
import { ProjectForm } from '@/features/projects/components/project-form';
import { useWords } from '@/lib/i18n';

export function Component() {
  const t = useWords();
  const navigate = useNavigate();
  const females = useAnimals({ sex: 'female', mature: true, limit: 200, sort: 'label' });
  const males = useAnimals({ sex: 'male', mature: true, limit: 200, sort: 'label' });
  if (females.isPending || males.isPending) return <PageLoader />;
  if (females.isError || males.isError) return <Alert color="clay">{(females.error ?? males.error)?.message}</Alert>;
  return (
    <>
      <PageHeader
        title={t('page.projects.newProject.title')}
        description={t('page.projects.newProject.description')}
        actions={
          <Anchor component={Link} to={paths.projects.href()} size="sm">
            {t('page.projects.newProject.allProjects')}
          </Anchor>
        }
      />
      <ProjectForm
        females={females.data.items.filter(mayStartProject)}
        males={males.data.items.filter((a) => mayStartProject(a) && a.custody !== 'loan-out')}
        onCreated={({ project, problems }) => {
          for (const p of problems) notifications.show({ color: 'amber', title: t('page.projects.newProject.notAllSaved'), message: p, autoClose: false });
          navigate(paths.project.href(project.id));
        }}
      />
    </>
  );
}

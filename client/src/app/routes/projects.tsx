import { Alert, Button } from '@mantine/core';
import type { QueryClient } from '@tanstack/react-query';
import { Link } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { PageLoader } from '@/components/ui/page-loader';
import { paths } from '@/config/paths';
import { projectQueries, useProjects } from '@/features/projects/api/projects';
import { ProjectTable } from '@/features/projects/components/project-table';
import { useDashboard } from '@/features/dashboard/api/dashboard';
import type { DashboardResponse, ProjectSummary } from '@broodsilk/shared';
import { words, useWords } from '@/lib/i18n';

/** The next thing due per project, from the dashboard's lists (most pressing first). */
function nextDueFrom(dashboard: DashboardResponse | undefined) {
  return (p: ProjectSummary): string | null => {
    if (!dashboard) return null;
    const roll = dashboard.dueToday.rolls.find((r) => r.projectId === p.id);
    if (roll?.sac.roll) return words(roll.sac.roll.status === 'overdue' ? 'page.projects.list.rollOverdue' : 'page.projects.list.rollDue');
    const today = dashboard.dueToday.pullWindows.find((w) => w.projectId === p.id);
    if (today) return words(today.event === 'closes-today' ? 'page.projects.list.pullClosesToday' : 'page.projects.list.pullOpensToday');
    const upcoming = dashboard.upcomingPullWindows.find((w) => w.projectId === p.id);
    if (upcoming) {
      const w = upcoming.sac.pullWindow;
      return w.state === 'not-yet' ? words('page.projects.list.pullFrom', { date: w.opensOn }) : words('page.projects.list.pullBy', { date: w.closesOn });
    }
    return null;
  };
}

export const clientLoader = (qc: QueryClient) => async () => {
  await qc.ensureQueryData(projectQueries.list());
  return null;
};

export function Component() {
  const t = useWords();
  const projects = useProjects();
  const dashboard = useDashboard();
  return (
    <>
      <PageHeader
        title={t('page.projects.list.title')}
        description={t('page.projects.list.description')}
        actions={
          <Button component={Link} to={paths.newProject.href()}>
            {t('page.projects.list.newProject')}
          </Button>
        }
      />
      {projects.isPending ? (
        <PageLoader />
      ) : projects.isError ? (
        <Alert color="clay">{projects.error.message}</Alert>
      ) : (
        <ProjectTable projects={projects.data} projectHref={paths.project.href} nextDue={nextDueFrom(dashboard.data)} />
      )}
    </>
  );
}

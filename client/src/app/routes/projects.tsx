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
import { formatDate } from '@/lib/dates';

/** The next thing due per project, from the dashboard's lists (most pressing first). */
function nextDueFrom(dashboard: DashboardResponse | undefined) {
  return (p: ProjectSummary): string | null => {
    if (!dashboard) return null;
    const roll = dashboard.dueToday.rolls.find((r) => r.projectId === p.id);
    if (roll?.sac.roll) return roll.sac.roll.status === 'overdue' ? 'Roll overdue' : 'Roll due';
    const today = dashboard.dueToday.pullWindows.find((w) => w.projectId === p.id);
    if (today) return today.event === 'closes-today' ? 'Pull window closes today' : 'Pull window opens today';
    const upcoming = dashboard.upcomingPullWindows.find((w) => w.projectId === p.id);
    if (upcoming) {
      const w = upcoming.sac.pullWindow;
      return w.state === 'not-yet' ? `Pull from ${formatDate(w.opensOn)}` : `Pull by ${formatDate(w.closesOn)}`;
    }
    return null;
  };
}

export const clientLoader = (qc: QueryClient) => async () => {
  await qc.ensureQueryData(projectQueries.list());
  return null;
};

export function Component() {
  const projects = useProjects();
  const dashboard = useDashboard();
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

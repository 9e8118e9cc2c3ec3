import { Alert, Button, Group, Stack } from '@mantine/core';
import type { QueryClient } from '@tanstack/react-query';
import { Link } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { PageLoader } from '@/components/ui/page-loader';
import { paths } from '@/config/paths';
import { todayLabel } from '@/lib/today';
import { useMe } from '@/features/auth/api/me';
import { dashboardQueries, useDashboard } from '@/features/dashboard/api/dashboard';
import { calendarQueries } from '@/features/dashboard/api/calendar-feed';
import { CalendarFeedCard } from '@/features/dashboard/components/calendar-feed-card';
import { DashboardView } from '@/features/dashboard/components/dashboard-view';
import { preloadPanels } from '../preload';
import { useWords } from '@/lib/i18n';

export const clientLoader = (qc: QueryClient) => async () => {
  // Start loading early without waiting; the page shows its own loader and error.
  void preloadPanels(qc.ensureQueryData(dashboardQueries.today()), qc.ensureQueryData(calendarQueries.feed()));
  return null;
};

export function Component() {
  const t = useWords();
  const { data: me } = useMe();
  const dashboard = useDashboard();
  if (!me) return null;
  return (
    <Stack>
      <PageHeader
        title={t('page.dashboard.title')}
        description={todayLabel(me.timeZone)}
        actions={
          <Group gap="xs">
            <Button component={Link} to={paths.incubator.href()} variant="light">
              {t('page.dashboard.incubator')}
            </Button>
            <Button component={Link} to={paths.newProject.href()}>
              {t('page.dashboard.newProject')}
            </Button>
          </Group>
        }
      />
      {dashboard.isPending ? (
        <PageLoader />
      ) : dashboard.isError ? (
        <Alert color="clay">{dashboard.error.message}</Alert>
      ) : (
        <DashboardView data={dashboard.data} timeZone={me.timeZone} temperatureUnit={me.temperatureUnit} />
      )}
      <CalendarFeedCard />
    </Stack>
  );
}

import { Alert, Anchor, Button, Group, Stack } from '@mantine/core';
import type { QueryClient } from '@tanstack/react-query';
import { Link, type LoaderFunctionArgs } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { PageLoader } from '@/components/ui/page-loader';
import { useWords } from '@/lib/i18n';
import { paths } from '@/config/paths';
import { projectQueries } from '@/features/projects/api/projects';
import { broodQueries } from '@/features/sacs/api/brood';
import { careLogQueries } from '@/features/sacs/api/care-log';
import { openingQueries } from '@/features/sacs/api/opening';
import { sacQueries } from '@/features/sacs/api/sacs';
import { BroodCounts } from '@/features/sacs/components/brood-counts';
import { CareLogList } from '@/features/sacs/components/care-log-list';
import { OpeningPanel } from '@/features/sacs/components/opening-panel';
import { KeptBackPanel } from '@/features/sacs/components/kept-back-panel';
import { useOpening } from '@/features/sacs/api/opening';
import { SacOverview } from '@/features/sacs/components/sac-overview';
import { IncubatorRightsSwitch, SacSettingsForm } from '@/features/sacs/components/sac-settings-form';
import { SectionCard } from '@/components/ui/section-card';
import { preloadPanels } from '../preload';
import { useSacPage } from './use-sac-page';

/** The sac first (a 404 goes to the error boundary), then its project and panels together; the opening and brood only once it is opened. */
export const clientLoader =
  (qc: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = params.sacId!;
    const log = preloadPanels(qc.ensureInfiniteQueryData(careLogQueries.list(id)));
    const sac = await qc.ensureQueryData(sacQueries.detail(id));
    await Promise.all([
      log,
      preloadPanels(
        qc.ensureQueryData(projectQueries.detail(sac.projectId)),
        sac.opened && qc.ensureQueryData(openingQueries.detail(id)),
        sac.opened && qc.ensureQueryData(broodQueries.counts(id)),
      ),
    ]);
    return null;
  };

export function Component() {
  const t = useWords();
  const { me, sac, project } = useSacPage();
  const opening = useOpening(sac.data ?? { id: '', opened: false });
  if (!me || sac.isPending) return <PageLoader />;
  if (sac.isError) return <Alert color="clay">{sac.error.message}</Alert>;
  const s = sac.data;
  // A sac left with the mother is opened (or counted at emergence) where it lies, like a pulled one.
  const openable = s.pulled || s.leftWithMother || s.outcome === 'emerged';

  return (
    <Stack>
      <PageHeader
        title={t('page.sacs.laidOn', { date: s.layDate })}
        description={project.data ? `${project.data.title} · ${project.data.femaleAnimal.label} × ${project.data.maleAnimal.label}` : undefined}
        actions={
          <Group>
            {s.inIncubator && (
              <Button component={Link} to={paths.incubatorSac.href(s.id)}>
                {t('page.sacs.page.incubatorScreen')}
              </Button>
            )}
            <Anchor component={Link} to={paths.project.href(s.projectId)} size="sm">
              {t('page.sacs.page.backToProject')}
            </Anchor>
          </Group>
        }
      />
      <SacOverview sac={s} timeZone={me.timeZone} temperatureUnit={me.temperatureUnit} />
      <SectionCard title={t('page.sacs.page.careLog')}>
        <CareLogList sacId={s.id} timeZone={me.timeZone} temperatureUnit={me.temperatureUnit} canStrike={s.may.log} />
      </SectionCard>
      {openable && (
        <SectionCard title={t('page.sacs.page.opening')}>
          <OpeningPanel sac={s} timeZone={me.timeZone} canEdit={s.may.pullAndOpen} />
        </SectionCard>
      )}
      {(opening.data?.keptBack ?? 0) > 0 && (
        <SectionCard title={t('page.sacs.page.keptBack')} testId="kept-back-card">
          <KeptBackPanel sacId={s.id} timeZone={me.timeZone} canLog={s.may.log} canEnd={s.may.edit} />
        </SectionCard>
      )}
      {s.opened && (
        <SectionCard title={t('page.sacs.page.brood')}>
          <BroodCounts sacId={s.id} timeZone={me.timeZone} canRecord={s.may.log} stage={s.broodStage} />
        </SectionCard>
      )}
      {s.may.edit && (
        <SectionCard title={t('page.sacs.page.settings')}>
          <Stack>
            <SacSettingsForm sac={s} temperatureUnit={me.temperatureUnit} />
            {s.may.setIncubatorRights && <IncubatorRightsSwitch sac={s} />}
          </Stack>
        </SectionCard>
      )}
    </Stack>
  );
}

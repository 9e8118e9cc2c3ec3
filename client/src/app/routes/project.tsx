import { Alert, Anchor, Badge, Grid, Group, Stack, Text } from '@mantine/core';
import type { QueryClient } from '@tanstack/react-query';
import { isDealParty, isProjectOpen, type MaleClockRow, type ProjectResponse } from '@broodsilk/shared';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { PageLoader } from '@/components/ui/page-loader';
import { paths } from '@/config/paths';
import { useWords, words } from '@/lib/i18n';
import { useMe } from '@/features/auth/api/me';
import { pairingQueries } from '@/features/projects/api/pairings';
import { projectQueries, useProject, useProjectActivity } from '@/features/projects/api/projects';
import { termsQueries } from '@/features/projects/api/terms';
import { ActivityTimeline } from '@/features/projects/components/activity-timeline';
import { EndProjectForm } from '@/features/projects/components/end-project-form';
import { PairingsPanel } from '@/features/projects/components/pairings-panel';
import type { MaleOption } from '@/features/projects/components/pairing-form';
import { ProjectEndActions } from '@/features/projects/components/project-end-actions';
import { animalQueries, useMalesByClock } from '@/features/collection/api/animals';
import { PartiesPanel } from '@/features/projects/components/parties-panel';
import { ProjectAnimals } from '@/features/projects/components/project-animals';
import { StageLine } from '@/features/projects/components/stage-line';
import { TermsPanel } from '@/features/projects/components/terms-panel';
import { WarningsList } from '@/features/projects/components/warnings-list';
import { midSentence, ROLE_LABELS } from '@/features/projects/utils/labels';
import { sacQueries } from '@/features/sacs/api/sacs';
import { ProjectSacs } from '@/features/sacs/components/project-sacs';
import { calendarQueries } from '@/features/dashboard/api/calendar-feed';
import { CalendarFeedCard } from '@/features/dashboard/components/calendar-feed-card';
import { SectionCard } from '@/components/ui/section-card';
import { preloadPanels } from '../preload';

/**
 * A missing or foreign project throws its 404 into the route's error boundary. The panels load
 * alongside the project; the terms only for the parties to the deal (a caretaker would get 403).
 */
export const clientLoader =
  (qc: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = params.projectId!;
    const panels = preloadPanels(
      qc.ensureQueryData(projectQueries.activity(id)),
      qc.ensureQueryData(sacQueries.ofProject(id)),
      qc.ensureQueryData(pairingQueries.list(id)),
      qc.ensureQueryData(calendarQueries.feed()),
    );
    const project = await qc.ensureQueryData(projectQueries.detail(id));
    const isOwner = project.myRole === 'owner';
    await Promise.all([
      panels,
      preloadPanels(isDealParty(project.myRole) && qc.ensureQueryData(termsQueries.list(id)), isOwner && qc.ensureQueryData(animalQueries.males())),
    ]);
    return null;
  };

/**
 * The males the keeper can name in a pairing: the project's own (the latest living one first, the
 * usual choice for the next attempt), then the keeper's other mature males as backups.
 */
function maleOptions(p: ProjectResponse, mature: readonly MaleClockRow[]): MaleOption[] {
  const own = [...p.males].reverse().sort((a, b) => Number(a.status === 'deceased') - Number(b.status === 'deceased'));
  const ids = new Set(own.map((m) => m.id));
  return [
    ...own.map((m) => ({ value: m.id, label: m.status === 'deceased' ? words('page.projects.page.maleDied', { label: m.label }) : m.label })),
    ...mature
      .filter((r) => !ids.has(r.animal.id))
      .map((r) => ({ value: r.animal.id, label: words('page.projects.page.maleBackup', { label: r.animal.label }) })),
  ];
}

export function Component() {
  const t = useWords();
  const { projectId } = useParams() as { projectId: string };
  const { data: me } = useMe();
  const project = useProject(projectId);
  const activity = useProjectActivity(projectId);
  const isKeeper = project.data?.myRole === 'owner';
  const mature = useMalesByClock(isKeeper);
  if (!me || project.isPending) return <PageLoader />;
  if (project.isError) return <Alert color="clay">{project.error.message}</Alert>;
  const p = project.data;
  const isOwner = p.myRole === 'owner';
  const live = isProjectOpen(p.stage.stage);

  return (
    <Stack>
      <PageHeader
        title={p.title}
        description={t('page.projects.page.description', {
          female: p.femaleAnimal.label,
          males: p.males.map((m) => m.label).join(' / '),
          owner: p.owner.name,
          role: midSentence(ROLE_LABELS[p.myRole]),
        })}
        actions={
          <Group gap="md">
            {isDealParty(p.myRole) && (
              <Anchor component={Link} to={paths.projectAccount.href(p.id)} size="sm" fw={600}>
                {t('page.projects.page.account')}
              </Anchor>
            )}
            <Anchor component={Link} to={paths.projects.href()} size="sm">
              {t('page.projects.page.allProjects')}
            </Anchor>
          </Group>
        }
      />
      <StageLine stage={p.stage} note={p.endedEarlyNote} />
      <WarningsList warnings={p.warnings} />
      <Grid>
        <Grid.Col span={{ base: 12, md: 7 }}>
          <Stack>
            <SectionCard title={t('page.projects.page.sacs')} testId="section-sacs">
              <ProjectSacs
                projectId={p.id}
                timeZone={me.timeZone}
                canRecord={isOwner && live}
                sacHref={paths.sac.href}
                incubatorHref={paths.incubatorSac.href}
              />
            </SectionCard>
            <SectionCard title={t('page.projects.page.pairings')} testId="section-pairings">
              <PairingsPanel
                projectId={p.id}
                timeZone={me.timeZone}
                canRecord={isOwner && live}
                canCorrect={isOwner}
                males={maleOptions(p, mature.data ?? [])}
              />
            </SectionCard>
            <SectionCard title={t('page.projects.page.terms')} testId="section-terms">
              {isDealParty(p.myRole) ? (
                <TermsPanel projectId={p.id} me={me} myRole={p.myRole} members={p.members} />
              ) : (
                <Text c="dimmed">{t('page.projects.page.termsNotYours')}</Text>
              )}
            </SectionCard>
          </Stack>
        </Grid.Col>
        <Grid.Col span={{ base: 12, md: 5 }}>
          <Stack>
            <SectionCard title={t(p.males.length > 1 ? 'page.projects.page.theAnimals' : 'page.projects.page.thePair')}>
              <ProjectAnimals female={p.femaleAnimal} males={p.males} />
            </SectionCard>
            <SectionCard title={t('page.projects.parties.label')} testId="section-parties">
              <PartiesPanel projectId={p.id} members={p.members} myRole={p.myRole} timeZone={me.timeZone} />
            </SectionCard>
            <SectionCard title={t('page.projects.page.timeline')} testId="section-timeline">
              {activity.isError ? (
                <Alert color="clay">{activity.error.message}</Alert>
              ) : activity.data ? (
                <ActivityTimeline events={activity.data} timeZone={me.timeZone} />
              ) : (
                <Text c="dimmed">{t('page.shell.loadingDots')}</Text>
              )}
            </SectionCard>
            <CalendarFeedCard />
            {p.notes && (
              <SectionCard title={t('page.projects.page.notes')}>
                <Text size="sm" style={{ whiteSpace: 'pre-wrap' }}>
                  {p.notes}
                </Text>
              </SectionCard>
            )}
            {isOwner && live && <EndProjectForm projectId={p.id} setback={p.stage.setback} />}
            {isOwner && <ProjectEndActions projectId={p.id} stage={p.stage.stage} />}
            {!live && (
              <Group>
                <Badge color="gray" variant="light" tt="none">
                  {p.stage.stage === 'closed'
                    ? p.closedOn
                      ? t('page.projects.page.closedOn', { date: p.closedOn })
                      : t('page.projects.page.closed')
                    : p.endedOn
                      ? t('page.projects.page.endedOn', { date: p.endedOn })
                      : t('page.projects.page.ended')}
                </Badge>
              </Group>
            )}
          </Stack>
        </Grid.Col>
      </Grid>
    </Stack>
  );
}

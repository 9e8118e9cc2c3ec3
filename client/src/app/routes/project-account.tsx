import { Alert, Anchor, Group } from '@mantine/core';
import { isDealParty } from '@broodsilk/shared';
import type { QueryClient } from '@tanstack/react-query';
import { Link, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { PageLoader } from '@/components/ui/page-loader';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/me';
import { projectQueries, useProject } from '@/features/projects/api/projects';
import { balancesQueries } from '@/features/account/api/balances';
import { entriesQueries } from '@/features/account/api/entries';
import { sharesQueries } from '@/features/account/api/shares';
import { AccountPanel } from '@/features/account/components/account-panel';
import { speciesQueries, useSpecies } from '@/features/species/api/species';
import { useWords } from '@/lib/i18n';
import { preloadPanels } from '../preload';

/** A missing or foreign project throws its 404 into the route's error boundary; the account loads only for a party to the deal. */
export const clientLoader =
  (qc: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = params.projectId!;
    const project = await qc.ensureQueryData(projectQueries.detail(id));
    if (isDealParty(project.myRole)) {
      await preloadPanels(
        qc.ensureQueryData(sharesQueries.detail(id)),
        qc.ensureQueryData(balancesQueries.detail(id)),
        qc.ensureInfiniteQueryData(entriesQueries.list(id)),
        qc.ensureQueryData(speciesQueries.detail(project.femaleAnimal.species.id)),
      );
    }
    return null;
  };

/** The Account of one project, for its owner and partners. */
export function Component() {
  const t = useWords();
  const { projectId } = useParams() as { projectId: string };
  const { data: me } = useMe();
  const project = useProject(projectId);
  // The young are the female's species: its trade listing (e.g. CITES) decides the sale form's caution.
  const species = useSpecies(project.data?.femaleAnimal.species.id);
  const [search] = useSearchParams();
  if (!me || project.isPending) return <PageLoader />;
  if (project.isError) return <Alert color="clay">{project.error.message}</Alert>;
  const p = project.data;
  const myMemberId = p.members.find((m) => m.userId === me.id)?.id ?? null;
  return (
    <>
      <PageHeader
        title={t('page.account.pageTitle', { title: p.title })}
        description={t('page.account.pageDescription', { owner: p.owner.name })}
        actions={
          <Group gap="md">
            <Anchor component={Link} to={paths.project.href(p.id)} size="sm">
              {t('page.account.backToProject')}
            </Anchor>
          </Group>
        }
      />
      {search.has('paid') && (
        <Alert color="moss" mb="md" role="status" title={t('page.account.paidTitle')}>
          {t('page.account.paidText')}
        </Alert>
      )}
      {search.has('cancelled') && (
        <Alert color="amber" mb="md" role="status">
          {t('page.account.cancelledText')}
        </Alert>
      )}
      {isDealParty(p.myRole) ? (
        <AccountPanel projectId={p.id} me={me} myRole={p.myRole} myMemberId={myMemberId} tradeListing={species.data?.tradeListing.value ?? null} />
      ) : (
        <Alert color="gray">{t('page.account.partiesOnly')}</Alert>
      )}
    </>
  );
}

import { Alert, Anchor, Group } from '@mantine/core';
import type { QueryClient } from '@tanstack/react-query';
import { Link, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { PageLoader } from '@/components/ui/page-loader';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/me';
import { projectQueries, useProject } from '@/features/projects/api/projects';
import { AccountPanel } from '@/features/account/components/account-panel';

/** A missing or foreign project throws its 404 into the route's error boundary. */
export const clientLoader =
  (qc: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    await qc.ensureQueryData(projectQueries.detail(params.projectId!));
    return null;
  };

/** The Account of one project, for its owner and partners. */
export function Component() {
  const { projectId } = useParams() as { projectId: string };
  const { data: me } = useMe();
  const project = useProject(projectId);
  const [search] = useSearchParams();
  if (!me || project.isPending) return <PageLoader />;
  if (project.isError) return <Alert color="clay">{project.error.message}</Alert>;
  const p = project.data;
  const myMemberId = p.members.find((m) => m.userId === me.id)?.id ?? null;
  return (
    <>
      <PageHeader
        title={`Account · ${p.title}`}
        description={`Shares, hand-overs, payments and the balance of each party, run by ${p.owner.name}`}
        actions={
          <Group gap="md">
            <Anchor component={Link} to={paths.project.href(p.id)} size="sm">
              Back to the project
            </Anchor>
          </Group>
        }
      />
      {search.has('paid') && (
        <Alert color="moss" mb="md" role="status" title="Payment made">
          The payment provider took your payment. It shows in the entries below as soon as the provider confirms it.
        </Alert>
      )}
      {search.has('cancelled') && (
        <Alert color="amber" mb="md" role="status">
          The payment was cancelled; nothing was paid.
        </Alert>
      )}
      {p.myRole === 'caretaker' ? (
        <Alert color="gray">The account of this project is seen by its owner and partners only.</Alert>
      ) : (
        <AccountPanel projectId={p.id} me={me} myRole={p.myRole} myMemberId={myMemberId} />
      )}
    </>
  );
}

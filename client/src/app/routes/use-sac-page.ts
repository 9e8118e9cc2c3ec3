import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router';
import { useMe } from '@/features/auth/api/me';
import { projectQueries } from '@/features/projects/api/projects';
import { useSac } from '@/features/sacs/api/sacs';

/** What both sac pages (full and incubator) read: the viewer, the sac of the URL and its project (for the role and the pair). */
export function useSacPage() {
  const { sacId } = useParams() as { sacId: string };
  const { data: me } = useMe();
  const sac = useSac(sacId);
  const project = useQuery({ ...projectQueries.detail(sac.data?.projectId ?? ''), enabled: !!sac.data });
  return { sacId, me, sac, project };
}

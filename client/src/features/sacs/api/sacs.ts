import { queryOptions, useMutation, useQuery, useQueryClient, type QueryKey } from '@tanstack/react-query';
import type { CreateSacRequest, IncubatorRightsRequest, IncubatorRightsResponse, PullSacRequest, SacResponse, UpdateSacRequest } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-keys';

export function fetchProjectSacs(projectId: string, signal?: AbortSignal): Promise<SacResponse[]> {
  return api.get<SacResponse[]>(`/projects/${projectId}/sacs`, { signal });
}

export function fetchSac(id: string, signal?: AbortSignal): Promise<SacResponse> {
  return api.get<SacResponse>(`/sacs/${id}`, { signal });
}

/**
 * ['sacs'] → ['sacs','project',projectId] · ['sacs','detail',id] · ['sacs','log',id] · ['sacs','opening',id] · ['sacs','brood',id].
 * A project's sacs are listed under the sacs keys (not the project's) so this feature owns them.
 */
export const sacQueries = {
  all: () => queryRoots.sacs,
  ofProject: (projectId: string) =>
    queryOptions({
      queryKey: [...sacQueries.all(), 'project', projectId] as const,
      queryFn: ({ signal }) => fetchProjectSacs(projectId, signal),
    }),
  detail: (id: string) =>
    queryOptions({
      queryKey: [...sacQueries.all(), 'detail', id] as const,
      queryFn: ({ signal }) => fetchSac(id, signal),
    }),
};

export function useProjectSacs(projectId: string) {
  return useQuery(sacQueries.ofProject(projectId));
}

export function useSac(id: string) {
  return useQuery(sacQueries.detail(id));
}

/**
 * A sac changed: every sac query (day N, roll and window states are derived together) and the
 * project pages and dashboard, whose stage and due lists follow from it (`meta.invalidates`).
 */
export const AFTER_SAC_CHANGE: readonly QueryKey[] = [queryRoots.sacs, queryRoots.projects, queryRoots.dashboard];

export function useCreateSac(projectId: string) {
  return useMutation({
    mutationFn: (body: CreateSacRequest) => api.post<SacResponse>(`/projects/${projectId}/sacs`, body),
    meta: { handlesErrors: true, invalidates: AFTER_SAC_CHANGE },
  });
}

export function useUpdateSac(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateSacRequest) => api.patch<SacResponse>(`/sacs/${id}`, body),
    meta: { handlesErrors: true, invalidates: AFTER_SAC_CHANGE },
    // The refetch under AFTER_SAC_CHANGE has already run; the answer is the same sac.
    onSuccess: (sac) => qc.setQueryData(sacQueries.detail(id).queryKey, sac),
  });
}

/** Records the pull (now or earlier); the answer is the sac. */
export function usePullSac(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: PullSacRequest) => api.post<SacResponse>(`/sacs/${id}/pull`, body),
    meta: { handlesErrors: true, invalidates: AFTER_SAC_CHANGE },
    onSuccess: (sac) => qc.setQueryData(sacQueries.detail(id).queryKey, sac),
  });
}

/** The owner's switch letting caretakers record the pull and the opening; every sac answer carries it. */
export function useSetIncubatorRights(projectId: string) {
  return useMutation({
    mutationFn: (body: IncubatorRightsRequest) => api.put<IncubatorRightsResponse>(`/projects/${projectId}/incubator-rights`, body),
    meta: { handlesErrors: true, invalidates: [queryRoots.sacs] },
  });
}

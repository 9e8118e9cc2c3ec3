import { queryOptions, useMutation, useQuery, type QueryKey } from '@tanstack/react-query';
import type {
  ActivityEventResponse,
  AddMemberRequest,
  CreateProjectRequest,
  EndProjectRequest,
  ProjectMemberResponse,
  ProjectResponse,
  ProjectSummary,
  UpdateProjectRequest,
} from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-keys';

export function fetchProjects(signal?: AbortSignal): Promise<ProjectSummary[]> {
  return api.get<ProjectSummary[]>('/projects', { signal });
}

export function fetchProject(id: string, signal?: AbortSignal): Promise<ProjectResponse> {
  return api.get<ProjectResponse>(`/projects/${id}`, { signal });
}

export function fetchProjectActivity(id: string, signal?: AbortSignal): Promise<ActivityEventResponse[]> {
  return api.get<ActivityEventResponse[]>(`/projects/${id}/activity`, { signal });
}

/**
 * ['projects'] → ['projects','list'] · ['projects','detail',id] · ['projects','detail',id,'activity'|'terms'|…].
 * Everything about one project sits under its detail key, so invalidating the detail refreshes the page.
 */
export const projectQueries = {
  all: () => queryRoots.projects,
  list: () =>
    queryOptions({
      queryKey: [...projectQueries.all(), 'list'] as const,
      queryFn: ({ signal }) => fetchProjects(signal),
    }),
  details: () => [...projectQueries.all(), 'detail'] as const,
  detail: (id: string) =>
    queryOptions({
      queryKey: [...projectQueries.details(), id] as const,
      queryFn: ({ signal }) => fetchProject(id, signal),
    }),
  activity: (id: string) =>
    queryOptions({
      queryKey: [...projectQueries.details(), id, 'activity'] as const,
      queryFn: ({ signal }) => fetchProjectActivity(id, signal),
    }),
};

export function useProjects() {
  return useQuery(projectQueries.list());
}

export function useProject(id: string) {
  return useQuery(projectQueries.detail(id));
}

export function useProjectActivity(id: string) {
  return useQuery(projectQueries.activity(id));
}

/** After any change to a project: its page (and everything under it) and the list (`meta.invalidates`). */
export function afterProjectChange(id: string): readonly QueryKey[] {
  return [projectQueries.detail(id).queryKey, projectQueries.list().queryKey];
}

export function createProject(body: CreateProjectRequest): Promise<ProjectResponse> {
  return api.post<ProjectResponse>('/projects', body);
}

export function addProjectMember(projectId: string, body: AddMemberRequest): Promise<ProjectMemberResponse> {
  return api.post<ProjectMemberResponse>(`/projects/${projectId}/members`, body);
}

export function useUpdateProject(id: string) {
  return useMutation({
    mutationFn: (body: UpdateProjectRequest) => api.patch<ProjectResponse>(`/projects/${id}`, body),
    meta: { handlesErrors: true, invalidates: afterProjectChange(id) },
  });
}

export function useEndProject(id: string) {
  return useMutation({
    mutationFn: (body: EndProjectRequest) => api.post<ProjectResponse>(`/projects/${id}/end`, body),
    meta: { handlesErrors: true, invalidates: afterProjectChange(id) },
  });
}

/** `close` (final) or `reopen` (undoes an early end); neither takes a body. */
export function useProjectEndStep(id: string, step: 'close' | 'reopen') {
  return useMutation({
    mutationFn: () => api.post<ProjectResponse>(`/projects/${id}/${step}`, {}),
    meta: { handlesErrors: true, invalidates: afterProjectChange(id) },
  });
}

export function useAddProjectMember(projectId: string) {
  return useMutation({
    mutationFn: (body: AddMemberRequest) => addProjectMember(projectId, body),
    meta: { handlesErrors: true, invalidates: afterProjectChange(projectId) },
  });
}

import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { StatementResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { accountKeys } from './keys';

/** Plain links download these: the session cookie authenticates a GET and the server names the file. */
export const statementFileUrl = (projectId: string, memberId: string, format: 'csv' | 'pdf') => `/api/projects/${projectId}/statements/${memberId}.${format}`;

export function fetchStatement(projectId: string, memberId: string, signal?: AbortSignal): Promise<StatementResponse> {
  return api.get<StatementResponse>(`/projects/${projectId}/statements/${memberId}`, { signal });
}

export const statementQueries = {
  detail: (projectId: string, memberId: string) =>
    queryOptions({
      queryKey: accountKeys.statement(projectId, memberId),
      queryFn: ({ signal }) => fetchStatement(projectId, memberId, signal),
    }),
};

export function useStatement(projectId: string, memberId: string | null) {
  return useQuery({ ...statementQueries.detail(projectId, memberId ?? ''), enabled: memberId !== null });
}

/** E-mails the statement to its party; nothing cached changes. */
export function useEmailStatement(projectId: string) {
  return useMutation({
    mutationFn: (memberId: string) => api.post<unknown>(`/projects/${projectId}/statements/${memberId}/email`),
    meta: { handlesErrors: true },
  });
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Me } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { isApiError } from '@/lib/api-error';
import { meQueryKey } from '@/lib/query-keys';

export const authKeys = { me: meQueryKey };

/** The signed-in user, or null when there is no session. */
export async function fetchMe(): Promise<Me | null> {
  try {
    return await api.get<Me>('/auth/me', { allowAnonymous: true });
  } catch (e) {
    if (isApiError(e) && e.statusCode === 401) return null;
    throw e;
  }
}

export const meQuery = () => queryOptions({ queryKey: authKeys.me, queryFn: fetchMe, staleTime: 5 * 60_000 });

export function useMe() {
  return useQuery(meQuery());
}

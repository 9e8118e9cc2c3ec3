import { keepPreviousData, queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import { NOTIFICATION_PAGE_SIZE, type NotificationPage, type NotificationResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-keys';

/** The shell asks again this often, so a reminder shows up without a reload. */
export const UNREAD_REFRESH_MS = 30_000;

export const notificationQueries = {
  /** ['notifications','page',n]: one page of one's own, newest first. */
  page: (page: number) =>
    queryOptions({
      queryKey: [...queryRoots.notifications, 'page', page] as const,
      queryFn: ({ signal }) =>
        api.get<NotificationPage>(`/notifications?limit=${NOTIFICATION_PAGE_SIZE}&offset=${(page - 1) * NOTIFICATION_PAGE_SIZE}`, { signal }),
    }),
  /** ['notifications','unread']: the count the shell shows, refreshed by itself. */
  unread: () =>
    queryOptions({
      queryKey: [...queryRoots.notifications, 'unread'] as const,
      queryFn: async ({ signal }) => (await api.get<NotificationPage>('/notifications?limit=1', { signal })).unread,
      refetchInterval: UNREAD_REFRESH_MS,
    }),
};

export function useNotificationPage(page: number) {
  return useQuery({ ...notificationQueries.page(page), placeholderData: keepPreviousData });
}

export function useUnreadCount() {
  return useQuery(notificationQueries.unread());
}

export function useMarkRead() {
  return useMutation({
    mutationFn: (id: string) => api.post<NotificationResponse>(`/notifications/${id}/read`),
    meta: { invalidates: [queryRoots.notifications] },
  });
}

export function useMarkAllRead() {
  return useMutation({
    mutationFn: () => api.post<{ marked: number }>('/notifications/read-all'),
    meta: { invalidates: [queryRoots.notifications] },
  });
}

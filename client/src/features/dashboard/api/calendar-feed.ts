import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { CalendarFeedResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-keys';

export function fetchCalendarFeed(signal?: AbortSignal): Promise<CalendarFeedResponse> {
  return api.get<CalendarFeedResponse>('/calendar/feed', { signal });
}

/** ['calendar','feed'] */
export const calendarQueries = {
  feed: () =>
    queryOptions({
      queryKey: [...queryRoots.calendar, 'feed'] as const,
      queryFn: ({ signal }) => fetchCalendarFeed(signal),
      staleTime: 5 * 60_000,
    }),
};

export function useCalendarFeed() {
  return useQuery(calendarQueries.feed());
}

/** A new secret address; the old one stops working. */
export function useRotateCalendarFeed() {
  return useMutation({
    mutationFn: () => api.post<CalendarFeedResponse>('/calendar/feed/rotate'),
    meta: { invalidates: [calendarQueries.feed().queryKey] },
  });
}

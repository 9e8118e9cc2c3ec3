import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CalendarFeedResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';

export function fetchCalendarFeed(signal?: AbortSignal): Promise<CalendarFeedResponse> {
  return api.get<CalendarFeedResponse>('/calendar/feed', { signal });
}

/** ['calendar','feed'] */
export const calendarQueries = {
  feed: () =>
    queryOptions({
      queryKey: ['calendar', 'feed'] as const,
      queryFn: ({ signal }) => fetchCalendarFeed(signal),
      staleTime: 5 * 60_000,
    }),
};

export function useCalendarFeed() {
  return useQuery(calendarQueries.feed());
}

/** A new secret address; the old one stops working. */
export function useRotateCalendarFeed() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<CalendarFeedResponse>('/calendar/feed/rotate'),
    onSuccess: async (feed) => {
      qc.setQueryData(calendarQueries.feed().queryKey, feed);
      await qc.invalidateQueries({ queryKey: calendarQueries.feed().queryKey });
    },
  });
}

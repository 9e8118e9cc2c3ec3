import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { ReminderPreferences, UpdateReminderPreferencesRequest } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-keys';

/** ['reminders','preferences']: one's own reminder choices. */
export const reminderQueries = {
  preferences: () =>
    queryOptions({
      queryKey: [...queryRoots.reminders, 'preferences'] as const,
      queryFn: ({ signal }) => api.get<ReminderPreferences>('/reminder-preferences', { signal }),
    }),
};

export function useReminderPreferences() {
  return useQuery(reminderQueries.preferences());
}

export function useUpdateReminderPreferences() {
  return useMutation({
    mutationFn: (body: UpdateReminderPreferencesRequest) => api.patch<ReminderPreferences>('/reminder-preferences', body),
    meta: { handlesErrors: true, invalidates: [reminderQueries.preferences().queryKey] },
  });
}

import { Divider, Stack, Title } from '@mantine/core';
import { useMe } from '@/features/auth/api/me';
import { ProfileForm } from '@/features/settings/components/profile-form';
import { PasswordForm } from '@/features/settings/components/password-form';
import { ReminderPreferencesForm } from '@/features/settings/components/reminder-preferences-form';
import { reminderQueries, useReminderPreferences } from '@/features/settings/api/reminder-preferences';
import type { QueryClient } from '@tanstack/react-query';
import { preloadPanels } from '../preload';
import { ExportCard } from '@/features/export/components/export-card';
import { PageHeader } from '@/components/ui/page-header';

export const clientLoader = (qc: QueryClient) => async () => {
  void preloadPanels(qc.ensureQueryData(reminderQueries.preferences()));
  return null;
};

export function Component() {
  const { data: me } = useMe();
  const { data: reminders } = useReminderPreferences();
  if (!me) return null;
  return (
    <Stack>
      <PageHeader title="Settings" description="How Broodsilk shows dates and temperatures to you." />
      <ProfileForm me={me} />
      <Divider my="md" />
      <Title order={3} size="h4">
        Password
      </Title>
      <PasswordForm />
      <Divider my="md" />
      <Title order={3} size="h4">
        Reminders
      </Title>
      {reminders && <ReminderPreferencesForm key={reminders.timeZone} preferences={reminders} />}
      <Divider my="md" />
      <ExportCard />
    </Stack>
  );
}

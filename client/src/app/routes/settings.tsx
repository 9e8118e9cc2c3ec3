import { Divider, Stack, Title } from '@mantine/core';
import { useMe } from '@/features/auth/api/me';
import { ProfileForm } from '@/features/settings/components/profile-form';
import { PasswordForm } from '@/features/settings/components/password-form';
import { ReminderPreferencesForm } from '@/features/settings/components/reminder-preferences-form';
import { reminderQueries, useReminderPreferences } from '@/features/settings/api/reminder-preferences';
import type { QueryClient } from '@tanstack/react-query';
import { preloadPanels } from '../preload';
import { secondFactorQuery } from '@/features/settings/api/second-factor';
import { SecondFactorSection } from '@/features/settings/components/second-factor-section';
import { ExportCard } from '@/features/export/components/export-card';
import { PageHeader } from '@/components/ui/page-header';
import { useWords } from '@/lib/i18n';

export const clientLoader = (qc: QueryClient) => async () => {
  void preloadPanels(qc.ensureQueryData(reminderQueries.preferences()), qc.ensureQueryData(secondFactorQuery()));
  return null;
};

export function Component() {
  const t = useWords();
  const { data: me } = useMe();
  const { data: reminders } = useReminderPreferences();
  if (!me) return null;
  return (
    <Stack>
      <PageHeader title={t('page.settings.title')} description={t('page.settings.description')} />
      <ProfileForm me={me} />
      <Divider my="md" />
      <Title order={3} size="h4">
        {t('page.settings.passwordHeading')}
      </Title>
      <PasswordForm />
      <Divider my="md" />
      <Title order={3} size="h4" id="security">
        {t('page.settings.securityHeading')}
      </Title>
      <SecondFactorSection />
      <Divider my="md" />
      <Title order={3} size="h4">
        {t('page.settings.remindersHeading')}
      </Title>
      {reminders && <ReminderPreferencesForm key={reminders.timeZone} preferences={reminders} />}
      <Divider my="md" />
      <ExportCard />
    </Stack>
  );
}

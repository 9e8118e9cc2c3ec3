import { Divider, Stack, Title } from '@mantine/core';
import { useMe } from '@/features/auth/api/me';
import { ProfileForm } from '@/features/settings/components/profile-form';
import { PasswordForm } from '@/features/settings/components/password-form';
import { ExportCard } from '@/features/export/components/export-card';
import { PageHeader } from '@/components/ui/page-header';

export function Component() {
  const { data: me } = useMe();
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
      <ExportCard />
    </Stack>
  );
}

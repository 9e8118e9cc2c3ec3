import { Card, Group, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import { todayLabel } from '@/lib/today';
import { useMe } from '@/features/auth/api/me';
import { PageHeader } from '@/components/ui/page-header';

export function Component() {
  const { data: me } = useMe();
  if (!me) return null;
  return (
    <Stack>
      <PageHeader title={`Good to see you, ${me.displayName}`} description={todayLabel(me.timeZone)} />
      <SimpleGrid cols={{ base: 1, sm: 2 }}>
        <Card withBorder>
          <Title order={3} size="h5" mb="xs">
            Your account
          </Title>
          <Group gap="xs">
            <Text size="sm" c="dimmed">
              E-mail
            </Text>
            <Text size="sm">{me.email}</Text>
          </Group>
          <Group gap="xs">
            <Text size="sm" c="dimmed">
              Time zone
            </Text>
            <Text size="sm">{me.timeZone}</Text>
          </Group>
          <Group gap="xs">
            <Text size="sm" c="dimmed">
              Temperatures in
            </Text>
            <Text size="sm">°{me.temperatureUnit}</Text>
          </Group>
        </Card>
      </SimpleGrid>
    </Stack>
  );
}

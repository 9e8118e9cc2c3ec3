import { Anchor, Group, Stack, Text } from '@mantine/core';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { DashboardSac } from '@broodsilk/shared';
import { paths } from '@/config/paths';
import { useWords } from '@/lib/i18n';

/** One sac on a Today card: its project, day and lay date, and what to do on the right. */
export function SacLine({ item, right }: { item: DashboardSac; right: ReactNode }) {
  const t = useWords();
  return (
    <Group justify="space-between" wrap="nowrap" gap="xs" py={4}>
      <Stack gap={0}>
        <Anchor component={Link} to={paths.sac.href(item.sac.id)} fw={600} size="sm">
          {item.projectTitle}
        </Anchor>
        <Text size="xs" c="dimmed">
          {t('page.dashboard.sacLine', { day: item.sac.dayNumber, date: item.sac.layDate })}
        </Text>
      </Stack>
      {right}
    </Group>
  );
}

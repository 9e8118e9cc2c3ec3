import { Anchor, Button, Card, Group, Stack, Text } from '@mantine/core';
import { Link } from 'react-router';
import { label, NOTIFICATION_PAGE_SIZE } from '@broodsilk/shared';
import { words } from '@/lib/i18n';
import { Pager } from '@/components/ui/pager';
import { formatInstant, withReadableDates } from '@/lib/dates';
import { useMarkAllRead, useMarkRead, useNotificationPage } from '../api/notifications';
import { subjectHref } from '../utils/subject-href';
import { useWords } from '@/lib/i18n';

/** One's own notifications, newest first: each leads to what it is about; following it marks it read. */
export function NotificationList({ page, onPage, timeZone }: { page: number; onPage: (p: number) => void; timeZone: string }) {
  const t = useWords();
  const { data } = useNotificationPage(page);
  const markRead = useMarkRead();
  const markAll = useMarkAllRead();
  if (!data) return null;
  const pages = Math.max(1, Math.ceil(data.total / NOTIFICATION_PAGE_SIZE));
  return (
    <Stack>
      <Group justify="space-between">
        <Text size="sm">{data.unread ? t('page.notifications.unread', { count: data.unread }) : t('page.notifications.allRead')}</Text>
        {data.unread > 0 && (
          <Button variant="default" size="compact-sm" loading={markAll.isPending} disabled={markAll.isPending} onClick={() => markAll.mutate()}>
            {t('page.notifications.markAll')}
          </Button>
        )}
      </Group>
      {data.items.length === 0 && <Text c="dimmed">{t('page.notifications.none')}</Text>}
      {data.items.map((n) => (
        <Card key={n.id} withBorder padding="sm" data-unread={n.readAt ? undefined : 'true'}>
          <Text size="xs" c="dimmed">
            {label(words, 'notificationKind', n.kind)} · {formatInstant(n.createdAt, timeZone)}
          </Text>
          <Anchor component={Link} to={subjectHref(n)} fw={n.readAt ? 400 : 700} onClick={() => !n.readAt && markRead.mutate(n.id)}>
            {withReadableDates(n.title)}
          </Anchor>
          <Text size="sm" style={{ whiteSpace: 'pre-line' }}>
            {withReadableDates(n.body)}
          </Text>
        </Card>
      ))}
      {pages > 1 && <Pager total={pages} value={page} onChange={onPage} size="lg" />}
    </Stack>
  );
}

import { Button, Card, CopyButton, Group, Text, TextInput, Title } from '@mantine/core';
import { useCalendarFeed, useRotateCalendarFeed } from '../api/calendar-feed';
import { useWords } from '@/lib/i18n';

/** The private iCalendar address for a phone calendar: copy it, or replace it if it leaked. */
export function CalendarFeedCard() {
  const t = useWords();
  const feed = useCalendarFeed();
  const rotate = useRotateCalendarFeed();
  return (
    <Card withBorder data-testid="calendar-feed">
      <Title order={3} size="h5" mb={4}>
        {t('page.dashboard.feed.title')}
      </Title>
      <Text size="sm" c="dimmed" mb="xs">
        {t('page.dashboard.feed.text')}
      </Text>
      {feed.isError ? (
        <Text size="sm" className="tone-failed">
          {t('page.dashboard.feed.notLoaded', { reason: feed.error.message })}
        </Text>
      ) : (
        <Group gap="xs" align="flex-end" wrap="nowrap">
          <TextInput
            aria-label={t('page.dashboard.feed.address')}
            readOnly
            value={feed.data?.url ?? ''}
            placeholder={t('page.shell.loadingDots')}
            style={{ flex: 1 }}
            onFocus={(e) => e.currentTarget.select()}
          />
          <CopyButton value={feed.data?.url ?? ''}>
            {({ copied, copy }) => (
              <Button variant="light" onClick={copy} disabled={!feed.data}>
                {copied ? t('page.dashboard.feed.copied') : t('page.dashboard.feed.copy')}
              </Button>
            )}
          </CopyButton>
        </Group>
      )}
      <Group mt="xs">
        <Button size="compact-sm" variant="subtle" color="clay" loading={rotate.isPending} onClick={() => rotate.mutate()}>
          {t('page.dashboard.feed.replace')}
        </Button>
      </Group>
    </Card>
  );
}

import { Button, Card, CopyButton, Group, Text, TextInput, Title } from '@mantine/core';
import { useCalendarFeed, useRotateCalendarFeed } from '../api/calendar-feed';

/** The private iCalendar address for a phone calendar: copy it, or replace it if it leaked. */
export function CalendarFeedCard() {
  const feed = useCalendarFeed();
  const rotate = useRotateCalendarFeed();
  return (
    <Card withBorder data-testid="calendar-feed">
      <Title order={3} size="h5" mb={4}>
        Calendar feed
      </Title>
      <Text size="sm" c="dimmed" mb="xs">
        Pull windows and rolls in your phone&apos;s calendar. Keep this address to yourself: anyone who has it can read your dates.
      </Text>
      {feed.isError ? (
        <Text size="sm" className="tone-failed">
          The feed address could not be loaded: {feed.error.message}
        </Text>
      ) : (
        <Group gap="xs" align="flex-end" wrap="nowrap">
          <TextInput
            aria-label="Calendar feed address"
            readOnly
            value={feed.data?.url ?? ''}
            placeholder="Loading…"
            style={{ flex: 1 }}
            onFocus={(e) => e.currentTarget.select()}
          />
          <CopyButton value={feed.data?.url ?? ''}>
            {({ copied, copy }) => (
              <Button variant="light" onClick={copy} disabled={!feed.data}>
                {copied ? 'Copied' : 'Copy'}
              </Button>
            )}
          </CopyButton>
        </Group>
      )}
      <Group mt="xs">
        <Button size="compact-sm" variant="subtle" color="clay" loading={rotate.isPending} onClick={() => rotate.mutate()}>
          Replace the address
        </Button>
      </Group>
    </Card>
  );
}

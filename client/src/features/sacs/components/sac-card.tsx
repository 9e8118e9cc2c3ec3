import { Anchor, Badge, Card, Group, Stack, Text } from '@mantine/core';
import { Link } from 'react-router';
import { countWords, type SacResponse } from '@broodsilk/shared';
import { formatDate } from '@/lib/dates';
import { broodLabel, PULL_WINDOW_TEXT, pullWindowSentence, ROLL_TEXT, rollSentence, SAC_OUTCOME_TEXT } from '../utils/sac-view';

/** One sac at a glance: day N, pull window with dates, next roll due. */
export function SacCard({ sac, timeZone, href, incubatorHref }: { sac: SacResponse; timeZone: string; href: string; incubatorHref?: string }) {
  const window = PULL_WINDOW_TEXT[sac.pullWindow.state];
  const roll = rollSentence(sac, timeZone);
  return (
    <Card withBorder padding="sm" data-testid="sac-card">
      <Group justify="space-between" wrap="wrap" align="flex-start" gap="xs">
        <Stack gap={2}>
          <Anchor component={Link} to={href} fw={700}>
            Sac laid {formatDate(sac.layDate)}
          </Anchor>
          <Text size="sm">
            <Text span fw={700} data-testid="sac-day">
              Day {sac.dayNumber}
            </Text>{' '}
            · {sac.pulled ? 'in the incubator' : 'with the mother'} · {broodLabel(sac.broodStage)}
            {sac.currentCount !== null && ` · ${countWords(sac.currentCount, sac.currentCountEstimated)} alive`}
          </Text>
        </Stack>
        {sac.outcome !== 'in-progress' ? (
          <Badge color={sac.outcome === 'failed' ? 'clay' : 'moss'} variant="light" tt="none">
            {SAC_OUTCOME_TEXT[sac.outcome]}
          </Badge>
        ) : (
          !sac.pulled && (
            <Badge color={window.color} variant="light" tt="none" data-testid="pull-window-badge">
              {window.label}
            </Badge>
          )
        )}
      </Group>
      <Text size="sm" mt={4} className={sac.pulled ? undefined : window.tone}>
        {pullWindowSentence(sac)}
      </Text>
      {roll && sac.roll && (
        <Group justify="space-between" mt={4}>
          <Text size="sm" className={ROLL_TEXT[sac.roll.status].tone} fw={600}>
            {roll}
          </Text>
          {incubatorHref && (
            <Anchor component={Link} to={incubatorHref} size="sm">
              Log at the incubator
            </Anchor>
          )}
        </Group>
      )}
    </Card>
  );
}

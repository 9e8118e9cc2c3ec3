import { Anchor, Badge, Card, Group, Stack, Text } from '@mantine/core';
import { Link } from 'react-router';
import type { SacResponse } from '@broodsilk/shared';
import { broodLabel, PULL_WINDOW_TEXT, pullWindowSentence, ROLL_TEXT, rollSentence, SAC_OUTCOME_TEXT, whereSacIs } from '../utils/sac-view';
import { useWords } from '@/lib/i18n';

/** One sac at a glance: day N, pull window with dates, next roll due. */
export function SacCard({ sac, timeZone, href, incubatorHref }: { sac: SacResponse; timeZone: string; href: string; incubatorHref?: string }) {
  const t = useWords();
  const window = PULL_WINDOW_TEXT[sac.pullWindow.state];
  const roll = rollSentence(sac, timeZone);
  return (
    <Card withBorder padding="sm" data-testid="sac-card">
      <Group justify="space-between" wrap="wrap" align="flex-start" gap="xs">
        <Stack gap={2}>
          <Anchor component={Link} to={href} fw={700}>
            {t('page.sacs.laidOn', { date: sac.layDate })}
          </Anchor>
          <Text size="sm">
            <Text span fw={700} data-testid="sac-day">
              {t('page.sacs.dayN', { day: sac.dayNumber })}
            </Text>{' '}
            · {whereSacIs(sac)} · {broodLabel(sac.broodStage)}
            {sac.currentCount !== null &&
              ` · ${t(sac.currentCountEstimated ? 'page.sacs.card.aliveAbout' : 'page.sacs.card.alive', { count: sac.currentCount })}`}
          </Text>
        </Stack>
        {sac.outcome !== 'in-progress' ? (
          <Badge color={sac.outcome === 'failed' ? 'clay' : 'moss'} variant="light" tt="none">
            {SAC_OUTCOME_TEXT[sac.outcome]}
          </Badge>
        ) : (
          !sac.pulled &&
          !sac.leftWithMother && (
            <Badge color={window.color} variant="light" tt="none" data-testid="pull-window-badge">
              {window.label}
            </Badge>
          )
        )}
      </Group>
      <Text size="sm" mt={4} className={sac.pulled || sac.leftWithMother ? undefined : window.tone}>
        {pullWindowSentence(sac)}
      </Text>
      {roll && sac.roll && (
        <Group justify="space-between" mt={4}>
          <Text size="sm" className={ROLL_TEXT[sac.roll.status].tone} fw={600}>
            {roll}
          </Text>
          {incubatorHref && (
            <Anchor component={Link} to={incubatorHref} size="sm">
              {t('page.sacs.card.logAtIncubator')}
            </Anchor>
          )}
        </Group>
      )}
    </Card>
  );
}

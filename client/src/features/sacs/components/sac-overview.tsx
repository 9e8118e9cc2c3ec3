import { Alert, Badge, Button, Card, Group, Select, SimpleGrid, Switch, Text } from '@mantine/core';
import { useState } from 'react';
import { SAC_FAILURE_REASONS, type SacFailureReason, type SacResponse } from '@broodsilk/shared';
import { formatDate, formatInstant } from '@/lib/dates';
import { isApiError } from '@/lib/api-error';
import { useUpdateSac } from '../api/sacs';
import { broodLabel, PULL_WINDOW_TEXT, pullWindowSentence, ROLL_TEXT, SAC_OUTCOME_TEXT } from '../utils/sac-view';
import { catalogueLabels } from '@/lib/i18n';

const FAILURE_LABELS = catalogueLabels('sacFailure');

/** Day N, the pull window with its dates, the roll state, and the keeper's pull and outcome actions. */
export function SacOverview({ sac, timeZone, canEdit }: { sac: SacResponse; timeZone: string; canEdit: boolean }) {
  const update = useUpdateSac(sac.id);
  const [error, setError] = useState<string | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const w = sac.pullWindow;
  const windowText = PULL_WINDOW_TEXT[w.state];

  async function change(body: Parameters<typeof update.mutateAsync>[0]) {
    setError(null);
    try {
      await update.mutateAsync(body);
    } catch (e) {
      setError(isApiError(e) ? e.message : 'Not saved. Try again.');
    }
  }

  return (
    <SimpleGrid cols={{ base: 1, sm: 3 }}>
      <Card withBorder padding="sm">
        <Text size="xs" c="dimmed" tt="uppercase" fw={600}>
          Day
        </Text>
        <Text fz={40} fw={800} lh={1.1} data-testid="sac-day-number">
          {sac.dayNumber}
        </Text>
        <Text size="sm" c="dimmed">
          laid {formatDate(sac.layDate)} (day 0) · {broodLabel(sac.broodStage)}
        </Text>
        {sac.outcome !== 'in-progress' && (
          <Badge mt={4} color={sac.outcome === 'failed' ? 'clay' : 'moss'} variant="light" tt="none">
            {SAC_OUTCOME_TEXT[sac.outcome]}
            {sac.failureReason ? `: ${FAILURE_LABELS[sac.failureReason].toLowerCase()}` : ''}
          </Badge>
        )}
      </Card>
      <Card withBorder padding="sm">
        <Group justify="space-between">
          <Text size="xs" c="dimmed" tt="uppercase" fw={600}>
            Pull window
          </Text>
          <Text size="xs" c="dimmed">
            day {w.fromDay}–{w.toDay} ({w.origin === 'sac' ? 'set for this sac' : w.origin === 'species' ? 'species' : 'usual'})
          </Text>
        </Group>
        {!sac.pulled && (
          <Text fw={700} className={windowText.tone} data-testid="pull-window-state">
            {windowText.label}
          </Text>
        )}
        <Text size="sm">{pullWindowSentence(sac)}</Text>
        {canEdit && !sac.pulled && sac.outcome === 'in-progress' && (
          <Button mt="xs" loading={update.isPending} onClick={() => change({ pulledAt: new Date().toISOString() })}>
            Pulled now
          </Button>
        )}
      </Card>
      <Card withBorder padding="sm">
        <Text size="xs" c="dimmed" tt="uppercase" fw={600}>
          Rolling
        </Text>
        {sac.roll ? (
          <>
            <Text fw={700} className={ROLL_TEXT[sac.roll.status].tone} data-testid="roll-state">
              {ROLL_TEXT[sac.roll.status].label}
            </Text>
            <Text size="sm">due {formatInstant(sac.roll.due, timeZone)}</Text>
            <Text size="sm" c="dimmed">
              every {sac.rollIntervalHours} h{sac.roll.lastRollAt ? ` · last ${formatInstant(sac.roll.lastRollAt, timeZone)}` : ' · not rolled yet'}
            </Text>
          </>
        ) : (
          <Text size="sm" c="dimmed" data-testid="roll-state">
            {!sac.pulled
              ? 'No rolls while the sac is with the mother.'
              : sac.rollingOff
                ? 'Rolling is turned off.'
                : 'The young are free-living; no more rolls.'}
          </Text>
        )}
        {canEdit && sac.pulled && (
          <Switch
            mt="xs"
            label="Roll this sac"
            checked={!sac.rollingOff}
            onChange={(e) => change({ rollingOff: !e.currentTarget.checked })}
            disabled={update.isPending}
          />
        )}
      </Card>
      {canEdit && sac.outcome === 'in-progress' && (
        <Group align="flex-end" style={{ gridColumn: '1 / -1' }}>
          <Select
            label="The sac failed"
            placeholder="Reason"
            data={SAC_FAILURE_REASONS.map((r) => ({ value: r, label: FAILURE_LABELS[r] }))}
            value={failure}
            onChange={setFailure}
            w={220}
          />
          <Button
            variant="light"
            color="clay"
            disabled={!failure}
            loading={update.isPending}
            onClick={() => change({ outcome: 'failed', failureReason: failure as SacFailureReason })}
          >
            Record as failed
          </Button>
        </Group>
      )}
      {error && (
        <Alert color="clay" role="alert" style={{ gridColumn: '1 / -1' }}>
          {error}
        </Alert>
      )}
    </SimpleGrid>
  );
}

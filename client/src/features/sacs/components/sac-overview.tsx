import { Alert, Badge, Button, Card, Group, SimpleGrid, Switch, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { useState } from 'react';
import { valueSourceLabel, type SacResponse, type TemperatureUnit } from '@broodsilk/shared';
import { formatDate, formatInstant } from '@/lib/dates';
import { isApiError } from '@/lib/api-error';
import { usePullSac, useUpdateSac } from '../api/sacs';
import { PullConfirmation } from './pull-confirmation';
import { FailureForm } from './failure-form';
import { broodLabel, PULL_WINDOW_TEXT, pullWindowSentence, readingAlertText, ROLL_TEXT, SAC_OUTCOME_TEXT } from '../utils/sac-view';
import { catalogueLabels, useWords } from '@/lib/i18n';

const FAILURE_LABELS = catalogueLabels('sacFailure');

/** Why no roll is due, in words. */
function noRollText(sac: SacResponse): string {
  if (!sac.pulled) return 'No rolls while the sac is with the mother: she turns it herself.';
  if (sac.rollingOff) return 'Rolling is turned off.';
  if (sac.outcome !== 'in-progress') return 'The sac has ended; no more rolls.';
  return sac.rollPastLegs ? 'The young are free-living; no more rolls.' : 'The legs have formed: rolling has stopped, checks and readings go on.';
}

/**
 * Day N, the pull window with its dates, the roll state, readings outside the band, and the actions
 * the viewer may take (`sac.may`, the server's own rule): the pull, leaving the sac with the mother, the outcome.
 */
export function SacOverview({ sac, timeZone, temperatureUnit }: { sac: SacResponse; timeZone: string; temperatureUnit: TemperatureUnit }) {
  const t = useWords();
  const canEdit = sac.may.edit;
  const update = useUpdateSac(sac.id);
  const pull = usePullSac(sac.id);
  const [pulling, pullDialog] = useDisclosure(false);
  const [error, setError] = useState<string | null>(null);
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
  const waiting = !sac.pulled && sac.outcome === 'in-progress';

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
          <Text size="xs" c="dimmed" data-testid="pull-window-origin">
            {t('pullWindowFrom', { from: w.fromDay, to: w.toDay, origin: t(`pullWindowOrigin.${w.origin}`) })}
          </Text>
        </Group>
        {w.source && (
          <Text size="xs" c="dimmed" fs="italic" data-testid="pull-window-source">
            {t('valueSource', { source: valueSourceLabel(t, w.source) })}
          </Text>
        )}
        {!sac.pulled &&
          (sac.leftWithMother ? (
            <Text fw={700} data-testid="pull-window-state">
              Left with the mother
            </Text>
          ) : (
            <Text fw={700} className={windowText.tone} data-testid="pull-window-state">
              {windowText.label}
            </Text>
          ))}
        <Text size="sm">{pullWindowSentence(sac)}</Text>
        {waiting && (sac.may.pullAndOpen || canEdit) && (
          <Group mt="xs" gap="xs">
            {sac.may.pullAndOpen && (
              <Button size="compact-md" loading={pull.isPending} onClick={pullDialog.open}>
                Record the pull
              </Button>
            )}
            {canEdit && (
              <Button size="compact-md" variant="light" loading={update.isPending} onClick={() => change({ leftWithMother: !sac.leftWithMother })}>
                {sac.leftWithMother ? 'Watch the pull window again' : 'Leave it with the mother'}
              </Button>
            )}
          </Group>
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
            {noRollText(sac)}
          </Text>
        )}
        {canEdit && sac.pulled && (
          <>
            <Switch
              mt="xs"
              label="Roll this sac"
              checked={!sac.rollingOff}
              onChange={(e) => change({ rollingOff: !e.currentTarget.checked })}
              disabled={update.isPending}
            />
            <Switch
              mt="xs"
              label="Keep rolling after the legs form"
              description="Usual practice stops at eggs with legs (trade facts §4)."
              checked={sac.rollPastLegs}
              onChange={(e) => change({ rollPastLegs: e.currentTarget.checked })}
              disabled={update.isPending}
            />
          </>
        )}
      </Card>
      {sac.readingAlerts.length > 0 && (
        <Alert color="clay" title="Reading outside the band" style={{ gridColumn: '1 / -1' }} data-testid="reading-alerts">
          {sac.readingAlerts.map((a) => (
            <Text size="sm" key={a.kind}>
              {readingAlertText(a, sac.band, temperatureUnit)}, logged {formatInstant(a.at, timeZone)}.
            </Text>
          ))}
        </Alert>
      )}
      {canEdit && sac.outcome === 'in-progress' && (
        <Group align="flex-end" style={{ gridColumn: '1 / -1' }}>
          <Button variant="light" loading={update.isPending} onClick={() => change({ outcome: 'emerged' })}>
            The young have emerged
          </Button>
        </Group>
      )}
      {canEdit && sac.outcome === 'in-progress' && <FailureForm sacId={sac.id} />}
      {error && (
        <Alert color="clay" role="alert" style={{ gridColumn: '1 / -1' }}>
          {error}
        </Alert>
      )}
      {pulling && (
        <PullConfirmation
          opened
          onClose={pullDialog.close}
          sac={sac}
          timeZone={timeZone}
          pending={pull.isPending}
          onConfirm={async (pulledAt) => {
            pullDialog.close();
            setError(null);
            try {
              await pull.mutateAsync({ pulledAt });
            } catch (e) {
              setError(isApiError(e) ? e.message : 'The pull was not saved. Try again.');
            }
          }}
        />
      )}
    </SimpleGrid>
  );
}

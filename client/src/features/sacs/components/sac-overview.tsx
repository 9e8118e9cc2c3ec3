import { Alert, Badge, Button, Card, Group, SimpleGrid, Switch, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { useState } from 'react';
import { valueSourceLabel, type SacResponse, type TemperatureUnit } from '@broodsilk/shared';
import { formatInstant } from '@/lib/dates';
import { isApiError } from '@/lib/api-error';
import { usePullSac, useUpdateSac } from '../api/sacs';
import { PullConfirmation } from './pull-confirmation';
import { FailureForm } from './failure-form';
import { broodLabel, midSentence, PULL_WINDOW_TEXT, pullWindowSentence, readingAlertText, ROLL_TEXT, SAC_OUTCOME_TEXT } from '../utils/sac-view';
import { catalogueLabels, useWords, words } from '@/lib/i18n';

const FAILURE_LABELS = catalogueLabels('sacFailure');

/** Why no roll is due, in words. */
function noRollText(sac: SacResponse): string {
  if (!sac.pulled) return words('page.sacs.noRoll.withMother');
  if (sac.rollingOff) return words('page.sacs.noRoll.off');
  if (sac.outcome !== 'in-progress') return words('page.sacs.noRoll.ended');
  return sac.rollPastLegs ? words('page.sacs.noRoll.freeLiving') : words('page.sacs.noRoll.legs');
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
  const [failing, failure] = useDisclosure(false);
  const [error, setError] = useState<string | null>(null);
  const w = sac.pullWindow;
  const windowText = PULL_WINDOW_TEXT[w.state];

  async function change(body: Parameters<typeof update.mutateAsync>[0]) {
    setError(null);
    try {
      await update.mutateAsync(body);
    } catch (e) {
      setError(isApiError(e) ? e.message : t('page.sacs.notSaved'));
    }
  }
  const waiting = !sac.pulled && sac.outcome === 'in-progress';

  return (
    <SimpleGrid cols={{ base: 1, sm: 3 }}>
      <Card withBorder padding="sm">
        <Text size="xs" c="dimmed" tt="uppercase" fw={600}>
          {t('page.sacs.overview.day')}
        </Text>
        <Text fz={40} fw={800} lh={1.1} data-testid="sac-day-number">
          {sac.dayNumber}
        </Text>
        <Text size="sm" c="dimmed">
          {t('page.sacs.overview.laid', { date: sac.layDate, stage: broodLabel(sac.broodStage) })}
        </Text>
        {sac.outcome !== 'in-progress' && (
          <Badge mt={4} color={sac.outcome === 'failed' ? 'clay' : 'moss'} variant="light" tt="none">
            {SAC_OUTCOME_TEXT[sac.outcome]}
            {sac.failureReason ? t('page.sacs.overview.failureReason', { reason: midSentence(FAILURE_LABELS[sac.failureReason]) }) : ''}
          </Badge>
        )}
      </Card>
      <Card withBorder padding="sm">
        <Group justify="space-between">
          <Text size="xs" c="dimmed" tt="uppercase" fw={600}>
            {t('page.sacs.overview.pullWindow')}
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
              {t('page.sacs.overview.leftWithMother')}
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
                {t('page.sacs.overview.recordPull')}
              </Button>
            )}
            {canEdit && (
              <Button size="compact-md" variant="light" loading={update.isPending} onClick={() => change({ leftWithMother: !sac.leftWithMother })}>
                {sac.leftWithMother ? t('page.sacs.overview.watchAgain') : t('page.sacs.overview.leaveWithMother')}
              </Button>
            )}
          </Group>
        )}
      </Card>
      <Card withBorder padding="sm">
        <Text size="xs" c="dimmed" tt="uppercase" fw={600}>
          {t('page.sacs.overview.rolling')}
        </Text>
        {sac.roll ? (
          <>
            <Text fw={700} className={ROLL_TEXT[sac.roll.status].tone} data-testid="roll-state">
              {ROLL_TEXT[sac.roll.status].label}
            </Text>
            <Text size="sm">{t('page.sacs.overview.due', { due: formatInstant(sac.roll.due, timeZone) })}</Text>
            <Text size="sm" c="dimmed">
              {sac.roll.lastRollAt
                ? t('page.sacs.overview.everyLast', { hours: sac.rollIntervalHours, last: formatInstant(sac.roll.lastRollAt, timeZone) })
                : t('page.sacs.overview.everyNotYet', { hours: sac.rollIntervalHours })}
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
              label={t('page.sacs.overview.rollThis')}
              checked={!sac.rollingOff}
              onChange={(e) => change({ rollingOff: !e.currentTarget.checked })}
              disabled={update.isPending}
            />
            <Switch
              mt="xs"
              label={t('page.sacs.overview.rollPastLegs')}
              description={t('page.sacs.overview.rollPastLegsHint')}
              checked={sac.rollPastLegs}
              onChange={(e) => change({ rollPastLegs: e.currentTarget.checked })}
              disabled={update.isPending}
            />
          </>
        )}
      </Card>
      {sac.readingAlerts.length > 0 && (
        <Alert color="clay" title={t('page.sacs.overview.readingOutside')} style={{ gridColumn: '1 / -1' }} data-testid="reading-alerts">
          {sac.readingAlerts.map((a) => (
            <Text size="sm" key={a.kind}>
              {t('page.sacs.overview.alertLogged', { alert: readingAlertText(a, sac.band, temperatureUnit), at: formatInstant(a.at, timeZone) })}
            </Text>
          ))}
        </Alert>
      )}
      {canEdit && sac.outcome === 'in-progress' && (
        <Group align="flex-end" style={{ gridColumn: '1 / -1' }}>
          <Button variant="light" loading={update.isPending} onClick={() => change({ outcome: 'emerged' })}>
            {t('page.sacs.overview.emerged')}
          </Button>
          {!failing && (
            <Button variant="subtle" color="clay" onClick={failure.open}>
              {t('page.sacs.failure.open')}
            </Button>
          )}
        </Group>
      )}
      {canEdit && sac.outcome === 'in-progress' && failing && <FailureForm sacId={sac.id} onCancel={failure.close} />}
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
              setError(isApiError(e) ? e.message : t('page.sacs.overview.pullNotSaved'));
            }
          }}
        />
      )}
    </SimpleGrid>
  );
}

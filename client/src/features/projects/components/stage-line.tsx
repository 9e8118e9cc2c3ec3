import { Alert, Badge, Box, Group, Stack, Text, Tooltip, VisuallyHidden } from '@mantine/core';
import { label, PROJECT_STAGE_LINE, type DerivedProjectStage } from '@broodsilk/shared';
import { useWords } from '@/lib/i18n';
import { ENDED_EARLY_LABELS, STAGE_LABELS, stageText } from '../utils/labels';
import classes from './stage-line.module.css';

/** The state of one step, as screen readers hear it (page.projects.stageLine.state.<state>). */
type StepState = 'done' | 'unrecorded' | 'current' | 'ahead' | 'ended';

/** Where step `i` stands against the current one (-1 for an ended project); a step passed without a record is "unrecorded". */
function stepState(stage: DerivedProjectStage, i: number, current: number): StepState {
  if (stage.stage === 'ended-early') return 'ended';
  if (i < current) return stage.unrecorded?.includes(PROJECT_STAGE_LINE[i]) ? 'unrecorded' : 'done';
  return i === current ? 'current' : 'ahead';
}

/**
 * The progress line of a project: eight short bars, done ones filled in moss, the current one
 * marked and named below. An ended project greys the line and names its reason in clay. A setback
 * (a sac eaten, a molt after pairing) is advice under the line: the project stays open.
 */
export function StageLine({ stage, note }: { stage: DerivedProjectStage; note?: string | null }) {
  const t = useWords();
  const ended = stage.stage === 'ended-early';
  const current = ended ? -1 : PROJECT_STAGE_LINE.indexOf(stage.stage);
  return (
    <Stack gap={6} data-testid="stage-line" aria-label={t('page.projects.stageLine.label')}>
      <ol className={classes.line}>
        {PROJECT_STAGE_LINE.map((s, i) => {
          const state = stepState(stage, i, current);
          return (
            <Tooltip key={s} label={STAGE_LABELS[s]} withinPortal>
              <li className={classes.step} data-state={state} aria-current={state === 'current' ? 'step' : undefined}>
                <span className={classes.bar} />
                <Text component="span" size="xs" className={classes.label} visibleFrom="md">
                  {STAGE_LABELS[s]}
                </Text>
                <VisuallyHidden>
                  {t('page.projects.stageLine.stepState', { stage: STAGE_LABELS[s], state: t(`page.projects.stageLine.state.${state}`) })}
                </VisuallyHidden>
              </li>
            </Tooltip>
          );
        })}
      </ol>
      {ended ? (
        <Group gap="xs">
          <Badge color="clay" variant="light">
            {label(t, 'projectStage', 'ended-early')}
          </Badge>
          <Text size="sm" className="tone-failed" fw={600} data-testid="stage-current">
            {stageText(stage.stage, stage.reason)}
          </Text>
          {note && (
            <Text size="sm" c="dimmed">
              — {note}
            </Text>
          )}
        </Group>
      ) : (
        <Box>
          <Text size="sm" fw={600} data-testid="stage-current">
            {stageText(stage.stage)}
            <Text span size="sm" c="dimmed" fw={400}>
              {' · '}
              {t('page.projects.stageLine.step', { step: current + 1, count: PROJECT_STAGE_LINE.length })}
            </Text>
          </Text>
        </Box>
      )}
      {stage.setback && (
        <Alert color="amber" variant="light" title={t('page.projects.stageLine.setbackTitle')} data-testid="stage-setback">
          {label(t, 'setback', stage.setback)}
        </Alert>
      )}
    </Stack>
  );
}

/** The stage as a small badge, for tables and cards. */
export function StageBadge({ stage }: { stage: DerivedProjectStage }) {
  const colour =
    stage.stage === 'ended-early' ? 'clay' : stage.setback ? 'amber' : stage.stage === 'closed' || stage.stage === 'shares-settled' ? 'gray' : 'moss';
  return (
    <Badge color={colour} variant="light" tt="none" data-testid="stage-badge" style={{ overflow: 'visible', maxWidth: 'none' }}>
      {stageText(stage.stage, stage.reason)}
      {stage.setback && ` · ${ENDED_EARLY_LABELS[stage.setback]}`}
    </Badge>
  );
}

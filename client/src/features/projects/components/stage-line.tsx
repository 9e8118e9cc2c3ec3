import { Alert, Badge, Box, Group, Stack, Text, Tooltip, VisuallyHidden } from '@mantine/core';
import { label, PROJECT_STAGE_LINE, type DerivedProjectStage } from '@broodsilk/shared';
import { words } from '@/lib/i18n';
import { ENDED_EARLY_LABELS, STAGE_LABELS, stageText } from '../utils/labels';
import classes from './stage-line.module.css';

const STATE_WORDS = { done: 'done', unrecorded: 'not recorded', current: 'now', ahead: 'ahead', ended: 'not reached' } as const;

/**
 * The progress line of a project: eight short bars, done ones filled in moss, the current one
 * marked and named below. An ended project greys the line and names its reason in clay. A setback
 * (a sac eaten, a molt after pairing) is advice under the line: the project stays open.
 */
export function StageLine({ stage, note }: { stage: DerivedProjectStage; note?: string | null }) {
  const ended = stage.stage === 'ended-early';
  const current = ended ? -1 : PROJECT_STAGE_LINE.indexOf(stage.stage);
  return (
    <Stack gap={6} data-testid="stage-line" aria-label="Project stage">
      <ol className={classes.line}>
        {PROJECT_STAGE_LINE.map((s, i) => {
          const state = ended ? 'ended' : i < current ? (stage.unrecorded?.includes(s) ? 'unrecorded' : 'done') : i === current ? 'current' : 'ahead';
          return (
            <Tooltip key={s} label={STAGE_LABELS[s]} withinPortal>
              <li className={classes.step} data-state={state} aria-current={state === 'current' ? 'step' : undefined}>
                <span className={classes.bar} />
                <Text component="span" size="xs" className={classes.label} visibleFrom="md">
                  {STAGE_LABELS[s]}
                </Text>
                <VisuallyHidden>
                  {STAGE_LABELS[s]}: {STATE_WORDS[state]}
                </VisuallyHidden>
              </li>
            </Tooltip>
          );
        })}
      </ol>
      {ended ? (
        <Group gap="xs">
          <Badge color="clay" variant="light">
            Ended early
          </Badge>
          <Text size="sm" className="tone-failed" fw={600} data-testid="stage-current">
            {stage.reason ? `Ended early: ${ENDED_EARLY_LABELS[stage.reason]}` : 'Ended early'}
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
              {' '}
              · step {current + 1} of {PROJECT_STAGE_LINE.length}
            </Text>
          </Text>
        </Box>
      )}
      {stage.setback && (
        <Alert color="amber" variant="light" title="Try again" data-testid="stage-setback">
          {label(words, 'setback', stage.setback)}
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

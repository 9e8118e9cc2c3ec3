import { Badge, Tooltip } from '@mantine/core';
import type { MaleClock } from '@broodsilk/shared';
import { CLOCK_STATES } from '../utils/animal-view';

/** The male clock state as a small badge; the tooltip gives the days since maturing. */
export function ClockBadge({ clock }: { clock: Pick<MaleClock, 'state' | 'daysSinceMaturing'> }) {
  const s = CLOCK_STATES[clock.state];
  return (
    <Tooltip label={`${s.hint} Day ${clock.daysSinceMaturing} since his maturing molt.`} multiline w={260} events={{ hover: true, focus: true, touch: true }}>
      <Badge variant="light" color={s.color} size="sm" tabIndex={0} style={{ textTransform: 'none' }} data-testid="clock-badge">
        {s.label}
      </Badge>
    </Tooltip>
  );
}

import { Badge, Tooltip } from '@mantine/core';
import type { MaleClock } from '@broodsilk/shared';
import { useWords } from '@/lib/i18n';
import { CLOCK_STATES } from '../utils/animal-view';

/** The male clock state as a small badge; the tooltip gives the days since maturing. */
export function ClockBadge({ clock }: { clock: Pick<MaleClock, 'state' | 'daysSinceMaturing'> }) {
  const t = useWords();
  const s = CLOCK_STATES[clock.state];
  return (
    <Tooltip
      label={t('page.collection.clock.badgeHint', { hint: s.hint, day: clock.daysSinceMaturing })}
      multiline
      w={260}
      events={{ hover: true, focus: true, touch: true }}
    >
      <Badge variant="light" color={s.color} size="sm" tabIndex={0} style={{ textTransform: 'none' }} data-testid="clock-badge">
        {s.label}
      </Badge>
    </Tooltip>
  );
}

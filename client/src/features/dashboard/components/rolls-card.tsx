import { Anchor, Stack, Text } from '@mantine/core';
import { Link } from 'react-router';
import type { DashboardSac } from '@broodsilk/shared';
import { paths } from '@/config/paths';
import { formatInstant } from '@/lib/dates';
import { ROLL_STATUS_TONE } from '@/lib/tones';
import { SectionCard } from '@/components/ui/section-card';
import { SacLine } from './sac-line';
import { catalogueLabels } from '@/lib/i18n';
import { useWords } from '@/lib/i18n';

const ROLL_LABEL = catalogueLabels('rollShort');

/** Rolls due soon, due or overdue (owner and caretakers), most late first. */
export function RollsCard({ rolls, timeZone }: { rolls: DashboardSac[]; timeZone: string }) {
  const t = useWords();
  const overdue = rolls.some((r) => r.sac.roll?.status === 'overdue');
  return (
    <SectionCard compact title={t('page.dashboard.rolls.title')} testId="card-rolls" accent={overdue ? 'clay' : rolls.length ? 'amber' : undefined}>
      {rolls.length === 0 ? (
        <Text size="sm" c="dimmed">
          {t('page.dashboard.rolls.none')}
        </Text>
      ) : (
        rolls.map((r) => {
          const s = { label: ROLL_LABEL[r.sac.roll!.status], ...ROLL_STATUS_TONE[r.sac.roll!.status] };
          return (
            <SacLine
              key={r.sac.id}
              item={r}
              right={
                <Stack gap={0} align="flex-end">
                  <Text size="sm" fw={700} className={s.tone} data-testid="roll-status">
                    {s.label}
                  </Text>
                  <Text size="xs" c="dimmed">
                    {formatInstant(r.sac.roll!.due, timeZone)}
                  </Text>
                  <Anchor component={Link} to={paths.incubatorSac.href(r.sac.id)} size="sm">
                    {t('page.dashboard.rolls.log')}
                  </Anchor>
                </Stack>
              }
            />
          );
        })
      )}
    </SectionCard>
  );
}

import { Anchor, Table, Text } from '@mantine/core';
import { Link } from 'react-router';
import type { DashboardSac } from '@broodsilk/shared';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/dates';
import { SectionCard } from '@/components/ui/section-card';
import { useWords } from '@/lib/i18n';

/** Sacs with the mother whose window is open or opens within 30 days. */
export function UpcomingCard({ upcoming }: { upcoming: DashboardSac[] }) {
  const t = useWords();
  return (
    <SectionCard compact title={t('page.dashboard.upcoming.title')} testId="card-upcoming">
      {upcoming.length === 0 ? (
        <Text size="sm" c="dimmed">
          {t('page.dashboard.upcoming.none')}
        </Text>
      ) : (
        <Table verticalSpacing={4} fz="sm">
          <Table.Tbody>
            {upcoming.map((u) => {
              const w = u.sac.pullWindow;
              const open = w.state === 'open' || w.state === 'closing';
              return (
                <Table.Tr key={u.sac.id}>
                  <Table.Td>
                    <Anchor component={Link} to={paths.sac.href(u.sac.id)} size="sm" fw={600}>
                      {u.projectTitle}
                    </Anchor>
                    <Text size="xs" c="dimmed">
                      {t('page.dashboard.upcoming.day', { day: u.sac.dayNumber })}
                    </Text>
                  </Table.Td>
                  <Table.Td>
                    <Text size="sm" className={w.state === 'closing' ? 'tone-due' : open ? 'tone-ok' : undefined} data-testid="upcoming-state">
                      {w.state === 'closing'
                        ? t('page.dashboard.upcoming.closing')
                        : open
                          ? t('page.dashboard.upcoming.open')
                          : t('page.dashboard.upcoming.opensIn', { days: w.daysUntilOpens })}
                    </Text>
                  </Table.Td>
                  <Table.Td>
                    <Text size="xs" c="dimmed">
                      {formatDate(w.opensOn)} – {formatDate(w.closesOn)}
                    </Text>
                  </Table.Td>
                </Table.Tr>
              );
            })}
          </Table.Tbody>
        </Table>
      )}
    </SectionCard>
  );
}

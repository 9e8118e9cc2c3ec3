import { Anchor, Table, Text } from '@mantine/core';
import { Link } from 'react-router';
import { paths } from '@/config/paths';
import type { MaleClockRow } from '@broodsilk/shared';
import { MALE_CLOCK_LABELS } from '@/lib/i18n';
import { MALE_CLOCK_TONE } from '@/lib/tones';
import { SectionCard } from '@/components/ui/section-card';
import { useWords } from '@/lib/i18n';

/** The viewer's own mature males with the most urgent clocks; the collection has them all. */
export function MalesCard({ males, count }: { males: MaleClockRow[]; count: number }) {
  const t = useWords();
  return (
    <SectionCard compact title={t('page.dashboard.males.title')} testId="card-males">
      {males.length === 0 ? (
        <Text size="sm" c="dimmed">
          {t('page.dashboard.males.none')}
        </Text>
      ) : (
        <Table verticalSpacing={4} fz="sm">
          <Table.Tbody>
            {males.map((m) => {
              const c = { ...MALE_CLOCK_LABELS[m.clock.state], ...MALE_CLOCK_TONE[m.clock.state] };
              return (
                <Table.Tr key={m.animal.id}>
                  <Table.Td>
                    <Text size="sm" fw={600}>
                      {m.animal.label}
                    </Text>
                    <Text size="xs" c="dimmed" fs="italic">
                      {m.animal.species.scientificName}
                    </Text>
                  </Table.Td>
                  <Table.Td>
                    <Text size="sm" className={c.tone}>
                      {c.label}
                    </Text>
                  </Table.Td>
                  <Table.Td>
                    <Text size="xs" c="dimmed">
                      {m.clock.daysUntilPastTypical > 0
                        ? t('page.dashboard.males.dayLeft', { day: m.clock.daysSinceMaturing, left: m.clock.daysUntilPastTypical })
                        : t('page.dashboard.males.day', { day: m.clock.daysSinceMaturing })}
                    </Text>
                  </Table.Td>
                </Table.Tr>
              );
            })}
          </Table.Tbody>
        </Table>
      )}
      {count > males.length && (
        <Anchor component={Link} to={`${paths.collection.href()}?view=males`} size="sm" mt="xs" display="inline-block">
          {t('page.dashboard.males.all', { count })}
        </Anchor>
      )}
    </SectionCard>
  );
}

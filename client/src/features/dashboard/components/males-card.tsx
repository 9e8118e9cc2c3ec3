import { Table, Text } from '@mantine/core';
import type { MaleClockRow } from '@broodsilk/shared';
import { MALE_CLOCK_LABELS } from '@/lib/i18n';
import { MALE_CLOCK_TONE } from '@/lib/tones';
import { SectionCard } from '@/components/ui/section-card';
import { useWords } from '@/lib/i18n';

/** The viewer's own mature males, most urgent clock first. */
export function MalesCard({ males }: { males: MaleClockRow[] }) {
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
            {males.slice(0, 8).map((m) => {
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
    </SectionCard>
  );
}

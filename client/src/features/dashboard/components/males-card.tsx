import { Table, Text } from '@mantine/core';
import type { MaleClockRow } from '@broodsilk/shared';
import { MALE_CLOCK_LABELS } from '@/lib/i18n';
import { MALE_CLOCK_TONE } from '@/lib/tones';
import { SectionCard } from '@/components/ui/section-card';

/** The viewer's own mature males, most urgent clock first. */
export function MalesCard({ males }: { males: MaleClockRow[] }) {
  return (
    <SectionCard compact title="Mature males" testId="card-males">
      {males.length === 0 ? (
        <Text size="sm" c="dimmed">
          No mature male in your collection.
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
                      day {m.clock.daysSinceMaturing}
                      {m.clock.daysUntilPastTypical > 0 ? ` · ${m.clock.daysUntilPastTypical} d left` : ''}
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

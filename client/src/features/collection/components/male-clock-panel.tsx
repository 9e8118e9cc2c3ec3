import { Card, Group, Stack, Table, Text, Title } from '@mantine/core';
import type { MaleClockView } from '@broodsilk/shared';
import { catalogueLabels, useWords } from '@/lib/i18n';
import { CLOCK_STATES } from '../utils/animal-view';

const ORIGIN = catalogueLabels('lifespanFrom');

/** A mature male's clock: where he stands, the dates it changes and what it runs against. */
export function MaleClockPanel({ clock }: { clock: MaleClockView }) {
  const t = useWords();
  const now = CLOCK_STATES[clock.state];
  return (
    <Card withBorder>
      <Stack gap="xs">
        <Title order={3} size="h5">
          {t('page.collection.clock.title')}
        </Title>
        <Group gap="xs" align="baseline">
          <Text fw={700} size="lg" className={now.tone}>
            {now.label}
          </Text>
          <Text size="sm" c="dimmed">
            {t('page.collection.clock.daySince', { day: clock.daysSinceMaturing, date: clock.maturedOn })}
          </Text>
        </Group>
        <Text size="sm">{now.hint}</Text>
        <Table verticalSpacing={4} aria-label={t('page.collection.clock.changes')}>
          <Table.Tbody>
            {clock.changes.map((c) => (
              <Table.Tr key={c.state} fw={c.state === clock.state ? 700 : undefined}>
                <Table.Td>
                  <Text size="sm" className={c.state === clock.state ? now.tone : undefined}>
                    {CLOCK_STATES[c.state].label}
                  </Text>
                </Table.Td>
                <Table.Td>
                  <Text size="sm">{t('page.collection.clock.from', { date: c.from })}</Text>
                </Table.Td>
              </Table.Tr>
            ))}
          </Table.Tbody>
        </Table>
        <Text size="xs" c="dimmed">
          {t('page.collection.clock.typical', { min: clock.lifespanMonths.min, max: clock.lifespanMonths.max, origin: ORIGIN[clock.lifespanMonths.from] })}
        </Text>
      </Stack>
    </Card>
  );
}

import { Card, Stack, Text, Title } from '@mantine/core';
import type { FemaleReadinessView } from '@broodsilk/shared';
import { formatDate } from '@/lib/dates';
import { READINESS_STATES } from '../utils/animal-view';

/** A mature female: days since her last molt and the keeper's premolt note. */
export function ReadinessPanel({ readiness }: { readiness: FemaleReadinessView }) {
  const s = READINESS_STATES[readiness.state];
  return (
    <Card withBorder>
      <Stack gap="xs">
        <Title order={3} size="h5">
          Pairing readiness
        </Title>
        <Text fw={700} size="lg" className={s.tone}>
          {s.label}
        </Text>
        {readiness.lastMoltOn && (
          <Text size="sm">
            Last molt {formatDate(readiness.lastMoltOn)} · {readiness.daysSinceMolt} days ago
          </Text>
        )}
        <Text size="sm">{readiness.note}</Text>
        {readiness.premoltNote && (
          <Text size="sm">
            <b>Premolt note:</b> {readiness.premoltNote}
          </Text>
        )}
      </Stack>
    </Card>
  );
}

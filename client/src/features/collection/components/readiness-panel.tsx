import { Card, Stack, Text, Title } from '@mantine/core';
import type { FemaleReadinessView } from '@broodsilk/shared';
import { useWords } from '@/lib/i18n';
import { READINESS_STATES } from '../utils/animal-view';

/** A mature female: days since her last molt and the keeper's premolt note. */
export function ReadinessPanel({ readiness }: { readiness: FemaleReadinessView }) {
  const t = useWords();
  const s = READINESS_STATES[readiness.state];
  return (
    <Card withBorder>
      <Stack gap="xs">
        <Title order={3} size="h5">
          {t('page.collection.readiness.title')}
        </Title>
        <Text fw={700} size="lg" className={s.tone}>
          {s.label}
        </Text>
        {readiness.lastMoltOn && (
          <Text size="sm">{t('page.collection.readiness.lastMolt', { date: readiness.lastMoltOn, count: readiness.daysSinceMolt })}</Text>
        )}
        <Text size="sm">{readiness.note}</Text>
        {readiness.premoltNote && (
          <Text size="sm">
            <b>{t('page.collection.readiness.premoltNote')}</b> {readiness.premoltNote}
          </Text>
        )}
      </Stack>
    </Card>
  );
}

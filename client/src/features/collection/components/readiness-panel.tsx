import { Card, Stack, Text, Title } from '@mantine/core';
import { FEMALE_HARDENING_DAYS, type FemaleReadinessView, type Words } from '@broodsilk/shared';
import { useWords } from '@/lib/i18n';
import { READINESS_STATES } from '../utils/animal-view';

/** The advice under her state, in the reader's words (the server's `note` says the same in English). */
function readinessNote(t: Words, r: FemaleReadinessView): string {
  const w = (key: string, values?: Record<string, unknown>) => t(`page.collection.readiness.${key}`, values);
  const lost = w('lostPairing');
  const ago = r.daysSinceMolt === null ? '' : w('ago', { count: r.daysSinceMolt });
  switch (r.state) {
    case 'premolt':
      return w('notePremolt', { date: r.premoltSince, days: FEMALE_HARDENING_DAYS });
    case 'no-molt-recorded':
      return w('noteNoMolt', { lost });
    case 'hardening':
      return w('noteHardening', { ago, count: FEMALE_HARDENING_DAYS - (r.daysSinceMolt ?? 0) });
    case 'ready':
      return w('noteReady', { ago, lost });
  }
}

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
        <Text size="sm">{readinessNote(t, readiness)}</Text>
        {readiness.premoltNote && (
          <Text size="sm">
            <b>{t('page.collection.readiness.premoltNote')}</b> {readiness.premoltNote}
          </Text>
        )}
      </Stack>
    </Card>
  );
}

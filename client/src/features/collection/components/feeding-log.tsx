import { Badge, Button, Group, Modal, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import type { FeedingResponse } from '@broodsilk/shared';
import { SectionCard } from '@/components/ui/section-card';
import { formatDate } from '@/lib/dates';
import { useWords } from '@/lib/i18n';
import { useFeedings } from '../api/animal-season';
import { FeedingForm } from './feeding-form';

/** The feeding log, newest first; a corrected entry stays, struck through, under its correction. */
export function FeedingLog({ animalId }: { animalId: string }) {
  const t = useWords();
  const { data: entries = [] } = useFeedings(animalId);
  const [form, setForm] = useState<{ correcting?: FeedingResponse } | null>(null);
  return (
    <SectionCard
      title={t('page.collection.feeding.title')}
      testId="feeding-log"
      action={
        <Button variant="light" onClick={() => setForm({})}>
          {t('page.collection.feeding.record')}
        </Button>
      }
    >
      {entries.length === 0 ? (
        <Text size="sm" c="dimmed">
          {t('page.collection.feeding.none')}
        </Text>
      ) : (
        <Stack gap="xs">
          {entries.map((e) => (
            <Group key={e.id} justify="space-between" wrap="nowrap" align="flex-start">
              <Stack gap={0} style={e.struckBy ? { textDecoration: 'line-through', opacity: 0.6 } : undefined}>
                <Group gap="xs">
                  <Text size="sm" fw={600}>
                    {formatDate(e.fedOn)}
                  </Text>
                  <Badge variant="light" tt="none" color={e.taken ? 'moss' : 'amber'}>
                    {t(e.taken ? 'page.collection.feeding.taken' : 'page.collection.feeding.refused')}
                  </Badge>
                </Group>
                <Text size="sm">{e.prey}</Text>
                {e.note && (
                  <Text size="sm" c="dimmed">
                    {e.note}
                  </Text>
                )}
                {e.strikes && (
                  <Text size="xs" c="dimmed">
                    {t('page.collection.feeding.corrects', { reason: e.strikes.reason })}
                  </Text>
                )}
              </Stack>
              {!e.struckBy && (
                <Button variant="subtle" size="compact-sm" onClick={() => setForm({ correcting: e })}>
                  {t('page.collection.feeding.correct')}
                </Button>
              )}
            </Group>
          ))}
        </Stack>
      )}
      <Modal
        opened={!!form}
        onClose={() => setForm(null)}
        title={t(form?.correcting ? 'page.collection.feeding.correctTitle' : 'page.collection.feeding.record')}
      >
        {form && <FeedingForm animalId={animalId} correcting={form.correcting} onDone={() => setForm(null)} />}
      </Modal>
    </SectionCard>
  );
}

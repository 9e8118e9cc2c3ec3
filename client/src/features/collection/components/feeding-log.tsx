import { Badge, Button, Group, Modal, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import type { FeedingResponse } from '@broodsilk/shared';
import { SectionCard } from '@/components/ui/section-card';
import { formatDate } from '@/lib/dates';
import { useFeedings } from '../api/animal-season';
import { FeedingForm } from './feeding-form';

/** The feeding log, newest first; a corrected entry stays, struck through, under its correction. */
export function FeedingLog({ animalId }: { animalId: string }) {
  const { data: entries = [] } = useFeedings(animalId);
  const [form, setForm] = useState<{ correcting?: FeedingResponse } | null>(null);
  return (
    <SectionCard
      title="Feeding log"
      testId="feeding-log"
      action={
        <Button variant="light" onClick={() => setForm({})}>
          Record a feeding
        </Button>
      }
    >
      {entries.length === 0 ? (
        <Text size="sm" c="dimmed">
          No feedings recorded yet.
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
                    {e.taken ? 'Taken' : 'Refused'}
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
                    Corrects an earlier entry: {e.strikes.reason}
                  </Text>
                )}
              </Stack>
              {!e.struckBy && (
                <Button variant="subtle" size="compact-sm" onClick={() => setForm({ correcting: e })}>
                  Correct
                </Button>
              )}
            </Group>
          ))}
        </Stack>
      )}
      <Modal opened={!!form} onClose={() => setForm(null)} title={form?.correcting ? 'Correct a feeding' : 'Record a feeding'}>
        {form && <FeedingForm animalId={animalId} correcting={form.correcting} onDone={() => setForm(null)} />}
      </Modal>
    </SectionCard>
  );
}

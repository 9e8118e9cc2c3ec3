import { Badge, Button, Group, Modal, Stack, Text, Timeline, Title } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import type { AnimalSex } from '@broodsilk/shared';
import { formatDate } from '@/lib/dates';
import { useWords } from '@/lib/i18n';
import { formatNumber } from '@/lib/numbers';
import { useMolts } from '../api/molts';
import { EXUVIA_LABELS } from '../utils/animal-view';
import { MoltForm } from './molt-form';

/** Molt history, newest first, with the command to record another. */
export function MoltTimeline({
  animalId,
  sex,
  editable,
  maturedOn = null,
}: {
  animalId: string;
  sex: AnimalSex;
  editable: boolean;
  maturedOn?: string | null;
}) {
  const t = useWords();
  const { data, isPending, isError, error } = useMolts(animalId);
  const [opened, { open, close }] = useDisclosure();
  const molts = [...(data ?? [])].sort((a, b) => (a.moltedOn < b.moltedOn ? 1 : a.moltedOn > b.moltedOn ? -1 : 0));
  return (
    <Stack>
      <Group justify="space-between">
        <Title order={3} size="h4">
          {t('page.collection.molts.title')}
        </Title>
        {editable && (
          <Button onClick={open} variant="light" size="md">
            {t('page.collection.molts.record')}
          </Button>
        )}
      </Group>
      {isPending && <Text c="dimmed">{t('page.shell.loadingDots')}</Text>}
      {isError && <Text className="tone-failed">{error.message}</Text>}
      {data && molts.length === 0 && (
        <Text c="dimmed" data-testid="no-molts">
          {maturedOn ? t('page.collection.molts.onlyMaturing', { date: maturedOn }) : t('page.collection.molts.none')}
        </Text>
      )}
      {molts.length > 0 && (
        <Timeline active={0} bulletSize={18} lineWidth={2} color="moss" aria-label={t('page.collection.molts.history')}>
          {molts.map((m, i) => (
            <Timeline.Item
              key={m.id}
              title={
                <Group gap="xs">
                  <Text fw={600} size="sm">
                    {formatDate(m.moltedOn)}
                  </Text>
                  {m.maturing && (
                    <Badge size="xs" color="amber" variant="light" style={{ textTransform: 'none' }}>
                      {t('page.collection.molts.maturingBadge')}
                    </Badge>
                  )}
                </Group>
              }
            >
              <Text size="sm" c="dimmed">
                {[
                  m.exuviaSex && t('page.collection.molts.exuvia', { sex: EXUVIA_LABELS[m.exuviaSex] }),
                  m.sizeCm != null && t('page.collection.molts.size', { size: formatNumber(m.sizeCm) }),
                ]
                  .filter(Boolean)
                  .join(' · ') || t(i === molts.length - 1 ? 'page.collection.molts.first' : 'page.collection.molts.molt')}
              </Text>
              {m.notes && <Text size="sm">{m.notes}</Text>}
            </Timeline.Item>
          ))}
        </Timeline>
      )}
      <Modal opened={opened} onClose={close} title={t('page.collection.molts.record')} centered>
        <MoltForm animalId={animalId} sex={sex} onDone={close} />
      </Modal>
    </Stack>
  );
}

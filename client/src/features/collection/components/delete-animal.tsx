import { Alert, Button, Group, Modal, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { useQueryClient } from '@tanstack/react-query';
import { useWords } from '@/lib/i18n';
import { forgetAnimal, useDeleteAnimal } from '../api/animals';

/** Delete is for a record made by mistake; a sold or dead animal is marked so instead. */
export function DeleteAnimal({ animalId, label, onDeleted }: { animalId: string; label: string; onDeleted: () => void | Promise<void> }) {
  const t = useWords();
  const [opened, { open, close }] = useDisclosure();
  const remove = useDeleteAnimal(animalId);
  const qc = useQueryClient();
  return (
    <>
      <Button variant="subtle" color="clay" onClick={open} size="md">
        {t('page.collection.remove.button')}
      </Button>
      <Modal
        opened={opened}
        onClose={() => {
          remove.reset();
          close();
        }}
        title={t('page.collection.remove.title', { label })}
        centered
      >
        <Stack>
          <Text size="sm">{t('page.collection.remove.explanation', { label })}</Text>
          {remove.error && (
            <Alert color="clay" variant="light" role="alert">
              <Text size="sm" className="tone-failed">
                {remove.error.message}
              </Text>
            </Alert>
          )}
          <Group justify="flex-end">
            <Button variant="default" onClick={close} size="md">
              {t('page.collection.remove.keep')}
            </Button>
            <Button
              color="clay"
              loading={remove.isPending}
              onClick={() =>
                remove.mutate(undefined, {
                  onSuccess: async () => {
                    await onDeleted();
                    forgetAnimal(qc, animalId);
                  },
                })
              }
              size="md"
            >
              {t('page.collection.remove.confirm')}
            </Button>
          </Group>
        </Stack>
      </Modal>
    </>
  );
}

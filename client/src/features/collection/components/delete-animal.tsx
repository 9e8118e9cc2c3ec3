import { Alert, Button, Group, Modal, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { useQueryClient } from '@tanstack/react-query';
import { forgetAnimal, useDeleteAnimal } from '../api/animals';

/** Delete is for a record made by mistake; a sold or dead animal is marked so instead. */
export function DeleteAnimal({ animalId, label, onDeleted }: { animalId: string; label: string; onDeleted: () => void | Promise<void> }) {
  const [opened, { open, close }] = useDisclosure();
  const remove = useDeleteAnimal(animalId);
  const qc = useQueryClient();
  return (
    <>
      <Button variant="subtle" color="clay" onClick={open} size="md">
        Delete
      </Button>
      <Modal
        opened={opened}
        onClose={() => {
          remove.reset();
          close();
        }}
        title={`Delete ${label}?`}
        centered
      >
        <Stack>
          <Text size="sm">
            Deleting removes the record, its molts and its photos for good. It is meant for a record made by mistake. If {label} was sold, lent out or has died,
            edit the status instead, so the history stays in your collection and in any project it was part of.
          </Text>
          {remove.error && (
            <Alert color="clay" variant="light" role="alert">
              <Text size="sm" className="tone-failed">
                {remove.error.message}
              </Text>
            </Alert>
          )}
          <Group justify="flex-end">
            <Button variant="default" onClick={close} size="md">
              Keep it
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
              Delete for good
            </Button>
          </Group>
        </Stack>
      </Modal>
    </>
  );
}

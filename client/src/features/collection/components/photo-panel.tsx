import { Alert, Image, Modal, SimpleGrid, Stack, Text, Title, UnstyledButton } from '@mantine/core';
import { Dropzone, IMAGE_MIME_TYPE, type FileRejection } from '@mantine/dropzone';
import '@mantine/dropzone/styles.css';
import { useState } from 'react';
import type { PhotoRef } from '@broodsilk/shared';
import { isApiError } from '@/lib/api-error';
import { photoSrc, useUploadAnimalPhoto } from '../api/photos';

export const PHOTO_LIMIT_MB = 15;

function rejectionMessage(rejections: FileRejection[]): string {
  const codes = rejections.flatMap((r) => r.errors.map((e) => e.code));
  if (codes.includes('file-too-large')) return `That photo is larger than ${PHOTO_LIMIT_MB} MB. Choose a smaller one.`;
  if (codes.includes('file-invalid-type')) return 'Only images can be added (JPEG, PNG, WebP, HEIC…).';
  return 'That file cannot be added.';
}

/** Photos of the animal: upload by drop or tap, thumbnails from the API, the full image on click. */
export function PhotoPanel({ animalId, photos, editable, label }: { animalId: string; photos: PhotoRef[]; editable: boolean; label: string }) {
  const upload = useUploadAnimalPhoto(animalId);
  const [refusal, setRefusal] = useState<string | null>(null);
  const [open, setOpen] = useState<PhotoRef | null>(null);
  return (
    <Stack>
      <Title order={3} size="h4">
        Photos
      </Title>
      {editable && (
        <Dropzone
          accept={IMAGE_MIME_TYPE}
          maxSize={PHOTO_LIMIT_MB * 1024 * 1024}
          multiple={false}
          loading={upload.isPending}
          onDrop={(files) => {
            setRefusal(null);
            if (files[0]) upload.mutate(files[0], { onError: (e) => setRefusal(isApiError(e) ? e.message : 'The photo could not be sent. Try again.') });
          }}
          onReject={(r) => setRefusal(rejectionMessage(r))}
          aria-label="Add a photo"
          inputProps={{ 'aria-label': 'Choose a photo to add' }}
          data-testid="photo-dropzone"
        >
          <Stack gap={2} align="center" py="md" mih={88} justify="center">
            <Text fw={600}>Drop a photo here or tap to choose one</Text>
            <Text size="sm" c="dimmed">
              Images only, up to {PHOTO_LIMIT_MB} MB. Location data is removed when it is saved.
            </Text>
          </Stack>
        </Dropzone>
      )}
      {refusal && (
        <Alert color="clay" variant="light" role="alert">
          <Text size="sm" className="tone-failed">
            {refusal}
          </Text>
        </Alert>
      )}
      {photos.length === 0 ? (
        <Text c="dimmed" size="sm">
          No photos yet.
        </Text>
      ) : (
        <SimpleGrid cols={{ base: 3, sm: 4, md: 6 }} spacing="xs" data-testid="photo-grid">
          {photos.map((p, i) => (
            <UnstyledButton key={p.id} onClick={() => setOpen(p)} aria-label={`Open photo ${i + 1} of ${label}`} style={{ minHeight: 44 }}>
              <Image src={photoSrc(p.thumbUrl)} alt={`${label}, photo ${i + 1}`} radius="sm" fit="cover" h={96} loading="lazy" />
            </UnstyledButton>
          ))}
        </SimpleGrid>
      )}
      <Modal opened={open !== null} onClose={() => setOpen(null)} size="auto" centered title={label}>
        {open && <Image src={photoSrc(open.url)} alt={`${label}, full size`} maw="min(90vw, 1200px)" mah="80vh" fit="contain" />}
      </Modal>
    </Stack>
  );
}

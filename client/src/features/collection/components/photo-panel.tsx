import { Alert, Image, Modal, SimpleGrid, Stack, Text, Title, UnstyledButton } from '@mantine/core';
import { Dropzone, IMAGE_MIME_TYPE, type FileRejection } from '@mantine/dropzone';
import '@mantine/dropzone/styles.css';
import { useState } from 'react';
import type { PhotoRef } from '@broodsilk/shared';
import type { Words } from '@broodsilk/shared';
import { isApiError } from '@/lib/api-error';
import { useWords } from '@/lib/i18n';
import { photoSrc, useUploadAnimalPhoto } from '../api/photos';

export const PHOTO_LIMIT_MB = 15;

function rejectionMessage(t: Words, rejections: FileRejection[]): string {
  const codes = rejections.flatMap((r) => r.errors.map((e) => e.code));
  if (codes.includes('file-too-large')) return t('page.collection.photos.tooLarge', { mb: PHOTO_LIMIT_MB });
  if (codes.includes('file-invalid-type')) return t('page.collection.photos.notAnImage');
  return t('page.collection.photos.cannotAdd');
}

/** Photos of the animal: upload by drop or tap, thumbnails from the API, the full image on click. */
export function PhotoPanel({ animalId, photos, editable, label }: { animalId: string; photos: PhotoRef[]; editable: boolean; label: string }) {
  const t = useWords();
  const upload = useUploadAnimalPhoto(animalId);
  const [refusal, setRefusal] = useState<string | null>(null);
  const [open, setOpen] = useState<PhotoRef | null>(null);
  return (
    <Stack>
      <Title order={3} size="h4">
        {t('page.collection.photos.title')}
      </Title>
      {editable && (
        <Dropzone
          accept={IMAGE_MIME_TYPE}
          maxSize={PHOTO_LIMIT_MB * 1024 * 1024}
          multiple={false}
          loading={upload.isPending}
          onDrop={(files) => {
            setRefusal(null);
            if (files[0]) upload.mutate(files[0], { onError: (e) => setRefusal(isApiError(e) ? e.message : t('page.collection.photos.notSent')) });
          }}
          onReject={(r) => setRefusal(rejectionMessage(t, r))}
          aria-label={t('page.collection.photos.add')}
          inputProps={{ 'aria-label': t('page.collection.photos.choose') }}
          data-testid="photo-dropzone"
        >
          <Stack gap={2} align="center" py="md" mih={88} justify="center">
            <Text fw={600}>{t('page.collection.photos.drop')}</Text>
            <Text size="sm" c="dimmed">
              {t('page.collection.photos.limits', { mb: PHOTO_LIMIT_MB })}
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
          {t('page.collection.photos.none')}
        </Text>
      ) : (
        <SimpleGrid cols={{ base: 3, sm: 4, md: 6 }} spacing="xs" data-testid="photo-grid">
          {photos.map((p, i) => (
            <UnstyledButton
              key={p.id}
              onClick={() => setOpen(p)}
              aria-label={t('page.collection.photos.open', { number: i + 1, label })}
              style={{ minHeight: 44 }}
            >
              <Image
                src={photoSrc(p.thumbUrl)}
                alt={t('page.collection.photos.thumbnail', { label, number: i + 1 })}
                radius="sm"
                fit="cover"
                h={96}
                loading="lazy"
              />
            </UnstyledButton>
          ))}
        </SimpleGrid>
      )}
      <Modal opened={open !== null} onClose={() => setOpen(null)} size="auto" centered title={label}>
        {open && <Image src={photoSrc(open.url)} alt={t('page.collection.photos.fullSize', { label })} maw="min(90vw, 1200px)" mah="80vh" fit="contain" />}
      </Modal>
    </Stack>
  );
}

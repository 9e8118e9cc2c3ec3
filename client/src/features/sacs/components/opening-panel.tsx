import { Alert, Image, NumberInput, SimpleGrid, Stack, Table, Text, Textarea } from '@mantine/core';
import { Dropzone, IMAGE_MIME_TYPE } from '@mantine/dropzone';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import type { OpeningResponse } from '@broodsilk/shared';
import { formatInstant } from '@/lib/dates';
import { applyServerErrors } from '@/lib/form-errors';
import { isApiError } from '@/lib/api-error';
import { useOpening, useRecordOpening, useUploadOpeningPhoto } from '../api/opening';
import { FormActions } from '@/components/ui/form-actions';

const COUNT_FIELDS = [
  ['healthyEggs', 'Healthy eggs'],
  ['eggsWithLegs', 'Eggs with legs'],
  ['nymphs', 'Nymphs'],
  ['darkEggs', 'Dark (non-viable)'],
  ['spoiledEggs', 'Spoiled'],
  ['keptBack', 'Back into incubation'],
] as const;

type CountKey = (typeof COUNT_FIELDS)[number][0];
type Values = Record<CountKey, number | string> & { notes: string };

function photoSrc(url: string) {
  return url.startsWith('/api/') || /^https?:/.test(url) ? url : `/api${url.startsWith('/') ? '' : '/'}${url}`;
}

function OpeningView({ opening, timeZone, sacId, canEdit }: { opening: OpeningResponse; timeZone: string; sacId: string; canEdit: boolean }) {
  const upload = useUploadOpeningPhoto(sacId);
  const [error, setError] = useState<string | null>(null);
  return (
    <Stack gap="xs" data-testid="opening">
      <Text size="sm" c="dimmed">
        Opened {formatInstant(opening.openedAt, timeZone)} by {opening.recordedBy.name}: {opening.viable} viable of {opening.total}.
      </Text>
      <Table verticalSpacing={2} fz="sm" maw={420}>
        <Table.Tbody>
          {COUNT_FIELDS.map(([k, label]) => (
            <Table.Tr key={k}>
              <Table.Td>{label}</Table.Td>
              <Table.Td ta="right" fw={600}>
                {opening[k]}
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
      {opening.notes && <Text size="sm">{opening.notes}</Text>}
      {opening.photos.length > 0 && (
        <SimpleGrid cols={{ base: 3, sm: 5 }}>
          {opening.photos.map((p) => (
            <Image key={p.id} src={photoSrc(p.thumbUrl)} alt="Photo of the opening" radius="sm" />
          ))}
        </SimpleGrid>
      )}
      {canEdit && (
        <Dropzone
          accept={IMAGE_MIME_TYPE}
          maxSize={15 * 1024 * 1024}
          loading={upload.isPending}
          onDrop={async (files) => {
            setError(null);
            for (const f of files) {
              try {
                await upload.mutateAsync(f);
              } catch (e) {
                setError(isApiError(e) ? e.message : 'The photo was not uploaded.');
              }
            }
          }}
          onReject={() => setError('Only images up to 15 MB.')}
          inputProps={{ 'aria-label': 'Choose photos of the opening' }}
        >
          <Text size="sm" ta="center" c="dimmed">
            Drop photos of the opening here, or tap to choose (location data is removed on upload).
          </Text>
        </Dropzone>
      )}
      {error && (
        <Text size="sm" className="tone-failed" role="alert">
          {error}
        </Text>
      )}
    </Stack>
  );
}

/** The opening of a sac: what was found, once; before that, the form to record it. */
export function OpeningPanel({ sacId, timeZone, canEdit }: { sacId: string; timeZone: string; canEdit: boolean }) {
  const opening = useOpening(sacId);
  const record = useRecordOpening(sacId);
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<Values>({
    mode: 'uncontrolled',
    initialValues: { healthyEggs: 0, eggsWithLegs: 0, nymphs: 0, darkEggs: 0, spoiledEggs: 0, keptBack: 0, notes: '' },
    validate: {
      keptBack: (v, values) =>
        Number(v) > Number(values.healthyEggs) + Number(values.eggsWithLegs) + Number(values.nymphs)
          ? 'No more than the viable ones (healthy eggs, eggs with legs, nymphs).'
          : null,
    },
  });
  if (opening.isPending) return <Text c="dimmed">Loading…</Text>;
  if (opening.isError) return <Alert color="clay">{opening.error.message}</Alert>;
  if (opening.data) return <OpeningView opening={opening.data} timeZone={timeZone} sacId={sacId} canEdit={canEdit} />;
  if (!canEdit) return <Text c="dimmed">Not opened yet.</Text>;

  const submit = form.onSubmit(async (v) => {
    setMessage(null);
    try {
      await record.mutateAsync({
        healthyEggs: Number(v.healthyEggs) || 0,
        eggsWithLegs: Number(v.eggsWithLegs) || 0,
        nymphs: Number(v.nymphs) || 0,
        darkEggs: Number(v.darkEggs) || 0,
        spoiledEggs: Number(v.spoiledEggs) || 0,
        keptBack: Number(v.keptBack) || 0,
        notes: v.notes.trim() || null,
      });
    } catch (e) {
      setMessage(applyServerErrors(form, e));
    }
  });
  return (
    <form onSubmit={submit} noValidate>
      <Stack>
        <Text size="sm" c="dimmed">
          Count what the sac holds when you open it. The viable ones start the brood&apos;s count.
        </Text>
        <SimpleGrid cols={{ base: 2, sm: 3 }}>
          {COUNT_FIELDS.map(([k, label]) => (
            <NumberInput key={form.key(k)} label={label} min={0} allowDecimal={false} inputMode="numeric" {...form.getInputProps(k)} />
          ))}
        </SimpleGrid>
        <Textarea label="Notes" autosize minRows={2} key={form.key('notes')} {...form.getInputProps('notes')} />
        <FormActions message={message} loading={record.isPending} submitLabel="Save opening" />
      </Stack>
    </form>
  );
}

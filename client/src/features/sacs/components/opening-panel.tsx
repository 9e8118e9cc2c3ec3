import { Alert, Image, SimpleGrid, Stack, Table, Text } from '@mantine/core';
import { Dropzone, IMAGE_MIME_TYPE } from '@mantine/dropzone';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { BROOD_COUNT_MAX, TEXT_LIMITS, type OpeningRequest, type OpeningResponse, type SacResponse } from '@broodsilk/shared';
import { NumberField } from '@/components/fields/number-field';
import { TextAreaField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { checkNumber, numberRule, readNumber } from '@/components/fields/typed-number';
import { useWhen, WhenFields } from '@/components/fields/when-fields';
import { ConfirmAction } from '@/components/ui/confirm-action';
import { formatInstant } from '@/lib/dates';
import { applyServerErrors } from '@/lib/form-errors';
import { isApiError } from '@/lib/api-error';
import { useOpening, useRecordOpening, useUploadOpeningPhoto } from '../api/opening';
import { FormActions } from '@/components/ui/form-actions';
import { SafetyNote } from '@/components/ui/safety-note';

const COUNT_FIELDS = [
  ['healthyEggs', 'Healthy eggs'],
  ['eggsWithLegs', 'Eggs with legs'],
  ['nymphs', 'Nymphs'],
  ['darkEggs', 'Dark (non-viable)'],
  ['spoiledEggs', 'Spoiled'],
  ['keptBack', 'Back into incubation'],
] as const;

type CountKey = (typeof COUNT_FIELDS)[number][0];
type Values = Record<CountKey, string> & { notes: string };

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

const COUNT = { min: 0, max: BROOD_COUNT_MAX, decimals: 0, rangeMessage: `A whole number from 0 to ${BROOD_COUNT_MAX}.` };

/** The opening of a sac: what was found, once; before that, the form to record it. */
export function OpeningPanel({ sac, timeZone, canEdit }: { sac: Pick<SacResponse, 'id' | 'opened'>; timeZone: string; canEdit: boolean }) {
  const sacId = sac.id;
  const opening = useOpening(sac);
  if (sac.opened && opening.isPending) return <Text c="dimmed">Loading…</Text>;
  if (opening.isError) return <Alert color="clay">{opening.error.message}</Alert>;
  if (opening.data) return <OpeningView opening={opening.data} timeZone={timeZone} sacId={sacId} canEdit={canEdit} />;
  if (!canEdit) return <Text c="dimmed">Not opened yet.</Text>;
  return <OpeningForm sacId={sacId} timeZone={timeZone} />;
}

/** Recorded once: the form is checked, then the keeper confirms what will be saved and when the sac was opened. */
function OpeningForm({ sacId, timeZone }: { sacId: string; timeZone: string }) {
  const record = useRecordOpening(sacId);
  const [message, setMessage] = useState<string | null>(null);
  const [asking, setAsking] = useState<OpeningRequest | null>(null);
  const form = useForm<Values>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { healthyEggs: '0', eggsWithLegs: '0', nymphs: '0', darkEggs: '0', spoiledEggs: '0', keptBack: '0', notes: '' },
    validate: {
      ...Object.fromEntries(COUNT_FIELDS.map(([k]) => [k, numberRule(COUNT)])),
      keptBack: (v, values) =>
        checkNumber(v, COUNT) ??
        ((readNumber(v) ?? 0) > (readNumber(values.healthyEggs) ?? 0) + (readNumber(values.eggsWithLegs) ?? 0) + (readNumber(values.nymphs) ?? 0)
          ? 'No more than the viable ones (healthy eggs, eggs with legs, nymphs).'
          : null),
      notes: textRule({ maxLength: TEXT_LIMITS.note }),
    },
  });
  const submit = form.onSubmit((v) => {
    setMessage(null);
    const counts = Object.fromEntries(COUNT_FIELDS.map(([k]) => [k, readNumber(v[k]) ?? 0])) as Record<CountKey, number>;
    setAsking({ ...counts, notes: v.notes.trim() || null });
  });
  return (
    <form onSubmit={submit} noValidate>
      <Stack>
        <Text size="sm" c="dimmed">
          Count what the sac holds when you open it. The viable ones start the brood&apos;s count.
        </Text>
        <SimpleGrid cols={{ base: 2, sm: 3 }}>
          {COUNT_FIELDS.map(([k, label]) => (
            <NumberField key={form.key(k)} label={label} whole {...form.getInputProps(k)} />
          ))}
        </SimpleGrid>
        <TextAreaField label="Notes" maxLength={TEXT_LIMITS.note} key={form.key('notes')} {...form.getInputProps('notes')} />
        <SafetyNote text="opening" />
        <FormActions message={message} loading={record.isPending} submitLabel="Save opening" />
      </Stack>
      {asking && (
        <ConfirmOpening
          counts={asking}
          timeZone={timeZone}
          pending={record.isPending}
          onClose={() => setAsking(null)}
          onConfirm={async (openedAt) => {
            try {
              await record.mutateAsync({ ...asking, openedAt });
            } catch (e) {
              setMessage(applyServerErrors(form, e));
            }
            setAsking(null);
          }}
        />
      )}
    </form>
  );
}

function ConfirmOpening({
  counts,
  timeZone,
  pending,
  onClose,
  onConfirm,
}: {
  counts: OpeningRequest;
  timeZone: string;
  pending: boolean;
  onClose: () => void;
  onConfirm: (openedAt: string) => void;
}) {
  const when = useWhen(timeZone);
  const viable = counts.healthyEggs + counts.eggsWithLegs + counts.nymphs;
  return (
    <ConfirmAction
      opened
      onClose={onClose}
      title="Record the opening"
      confirmLabel="Record the opening"
      pending={pending}
      ready={when.instant !== null}
      onConfirm={() => when.instant && onConfirm(when.instant)}
    >
      <Text size="sm">
        A sac is opened once: this records {viable} viable of {viable + counts.darkEggs + counts.spoiledEggs}, and the viable ones start the brood&apos;s count.
        Change the day or time if you opened it earlier.
      </Text>
      <WhenFields when={when} dateLabel="Opened on" />
    </ConfirmAction>
  );
}

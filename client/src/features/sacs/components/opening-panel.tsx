import { Alert, Button, Group, Image, SimpleGrid, Stack, Table, Text } from '@mantine/core';
import { Dropzone, IMAGE_MIME_TYPE } from '@mantine/dropzone';
import '@mantine/dropzone/styles.css';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { countWords, type OpeningRequest, type OpeningResponse, type SacResponse } from '@broodsilk/shared';
import { useWhen, WhenFields } from '@/components/fields/when-fields';
import { ConfirmAction } from '@/components/ui/confirm-action';
import { WarningConfirm, useWarnedSave } from '@/components/ui/warning-confirm';
import { formatInstant } from '@/lib/dates';
import { applyServerErrors } from '@/lib/form-errors';
import { isApiError } from '@/lib/api-error';
import { useOpening, useRecordOpening, useUploadOpeningPhoto } from '../api/opening';
import { FormActions } from '@/components/ui/form-actions';
import { SafetyNote } from '@/components/ui/safety-note';
import { countFields, openingRules, openingValues, toOpeningCounts, type OpeningValues } from '../utils/opening-values';
import { OpeningCountFields } from './opening-count-fields';
import { OpeningCorrection } from './opening-correction';

function photoSrc(url: string) {
  return url.startsWith('/api/') || /^https?:/.test(url) ? url : `/api${url.startsWith('/') ? '' : '/'}${url}`;
}

type OpeningVersion = Omit<OpeningResponse, 'struck' | 'photos'>;

/** What one version of the opening found; a struck version is drawn struck through and says so. */
function OpeningCounts({ opening, timeZone, struck }: { opening: OpeningVersion; timeZone: string; struck?: boolean }) {
  const about = (n: number) => countWords(n, opening.estimated);
  return (
    <Stack gap={4} style={struck ? { textDecoration: 'line-through' } : undefined} data-testid={struck ? 'opening-struck' : 'opening-in-force'}>
      <Text size="sm" c="dimmed">
        {struck ? 'Struck: ' : ''}Opened {formatInstant(opening.openedAt, timeZone)} by {opening.recordedBy.name}: {about(opening.viable)} viable of{' '}
        {about(opening.total)}
        {opening.keptBack > 0 ? `, ${opening.keptBack} of them kept back for more incubation` : ''}
        {opening.estimated ? ' (estimated)' : ''}.
      </Text>
      {opening.reason && <Text size="sm">Corrected because: {opening.reason}</Text>}
      {opening.warningReason && <Text size="sm">Unusual count, saved because: {opening.warningReason}</Text>}
      <Table verticalSpacing={2} fz="sm" maw={420} aria-label={struck ? 'Struck opening counts' : 'Opening counts'}>
        <Table.Tbody>
          {countFields().map(([k, label]) => (
            <Table.Tr key={k}>
              <Table.Td>{label}</Table.Td>
              <Table.Td ta="right" fw={600}>
                {k === 'keptBack' ? opening[k] : about(opening[k])}
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Stack>
  );
}

function OpeningView({ opening, timeZone, sacId, canEdit }: { opening: OpeningResponse; timeZone: string; sacId: string; canEdit: boolean }) {
  const upload = useUploadOpeningPhoto(sacId);
  const [error, setError] = useState<string | null>(null);
  const [correcting, setCorrecting] = useState(false);
  return (
    <Stack gap="xs" data-testid="opening">
      <OpeningCounts opening={opening} timeZone={timeZone} />
      {canEdit && !correcting && (
        <Group>
          <Button variant="light" size="xs" onClick={() => setCorrecting(true)}>
            Correct the opening
          </Button>
        </Group>
      )}
      {correcting && <OpeningCorrection opening={opening} onDone={() => setCorrecting(false)} />}
      {opening.struck.map((o) => (
        <OpeningCounts key={o.id} opening={o} timeZone={timeZone} struck />
      ))}
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
  const form = useForm<OpeningValues>({ mode: 'uncontrolled', validateInputOnBlur: true, initialValues: openingValues(), validate: openingRules });
  const warned = useWarnedSave(
    (body: OpeningRequest) => record.mutateAsync(body),
    () => undefined,
    (e) => setMessage(applyServerErrors(form, e)),
  );
  const submit = form.onSubmit((v) => {
    setMessage(null);
    setAsking(toOpeningCounts(v));
  });
  return (
    <form onSubmit={submit} noValidate>
      <Stack>
        <Text size="sm" c="dimmed">
          Count what the sac holds when you open it. The viable ones start the brood&apos;s count; doubtful eggs you keep back for more incubation are followed
          as their own batch and join the count only if they develop.
        </Text>
        <OpeningCountFields form={form} />
        {warned.warnings && <WarningConfirm warnings={warned.warnings} loading={record.isPending} onConfirm={warned.confirm} onCancel={warned.cancel} />}
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
            await warned.save({ ...asking, openedAt });
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
        A sac is opened once: this records {countWords(viable, !!counts.estimated)} viable of{' '}
        {countWords(viable + counts.darkEggs + counts.spoiledEggs, !!counts.estimated)}, and the viable ones
        {counts.keptBack ? ` except the ${counts.keptBack} kept back` : ''} start the brood&apos;s count. Change the day or time if you opened it earlier.
      </Text>
      <WhenFields when={when} dateLabel="Opened on" />
    </ConfirmAction>
  );
}

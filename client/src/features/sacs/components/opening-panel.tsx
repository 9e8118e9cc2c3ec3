import { Alert, Button, Group, Image, SimpleGrid, Stack, Table, Text } from '@mantine/core';
import { Dropzone, IMAGE_MIME_TYPE } from '@mantine/dropzone';
import '@mantine/dropzone/styles.css';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { openingCaution, type OpeningRequest, type OpeningResponse, type SacResponse } from '@broodsilk/shared';
import { useWhen, WhenFields } from '@/components/fields/when-fields';
import { ConfirmAction } from '@/components/ui/confirm-action';
import { WarningConfirm, useWarnedSave } from '@/components/ui/warning-confirm';
import { formatInstant } from '@/lib/dates';
import { applyServerErrors } from '@/lib/form-errors';
import { isApiError } from '@/lib/api-error';
import { useOpening, useRecordOpening, useUploadOpeningPhoto } from '../api/opening';
import { FormActions } from '@/components/ui/form-actions';
import { SafetyNote } from '@/components/ui/safety-note';
import { useWords } from '@/lib/i18n';
import { countText } from '../utils/sac-view';
import { countFields, openingRules, openingValues, toOpeningCounts, type OpeningValues } from '../utils/opening-values';
import { OpeningCountFields } from './opening-count-fields';
import { OpeningCorrection } from './opening-correction';

function photoSrc(url: string) {
  return url.startsWith('/api/') || /^https?:/.test(url) ? url : `/api${url.startsWith('/') ? '' : '/'}${url}`;
}

type OpeningVersion = Omit<OpeningResponse, 'struck' | 'photos'>;

/** What one version of the opening found; a struck version is drawn struck through and says so. */
function OpeningCounts({ opening, timeZone, struck }: { opening: OpeningVersion; timeZone: string; struck?: boolean }) {
  const t = useWords();
  const about = (n: number) => countText(t, n, opening.estimated);
  const sentence = t(`page.sacs.opening.opened${opening.keptBack > 0 ? 'Kept' : ''}${opening.estimated ? 'Estimated' : ''}`, {
    at: formatInstant(opening.openedAt, timeZone),
    name: opening.recordedBy.name,
    viable: about(opening.viable),
    total: about(opening.total),
    keptBack: opening.keptBack,
  });
  return (
    <Stack gap={4} style={struck ? { textDecoration: 'line-through' } : undefined} data-testid={struck ? 'opening-struck' : 'opening-in-force'}>
      <Text size="sm" c="dimmed">
        {struck ? t('page.sacs.opening.struck', { text: sentence }) : sentence}
      </Text>
      {opening.reason && <Text size="sm">{t('page.sacs.opening.correctedBecause', { reason: opening.reason })}</Text>}
      {opening.warningReason && <Text size="sm">{t('page.sacs.opening.unusualBecause', { reason: opening.warningReason })}</Text>}
      <Table verticalSpacing={2} fz="sm" maw={420} aria-label={struck ? t('page.sacs.opening.struckCounts') : t('page.sacs.opening.counts')}>
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
  const t = useWords();
  const upload = useUploadOpeningPhoto(sacId);
  const [error, setError] = useState<string | null>(null);
  const [correcting, setCorrecting] = useState(false);
  return (
    <Stack gap="xs" data-testid="opening">
      <OpeningCounts opening={opening} timeZone={timeZone} />
      {canEdit && !correcting && (
        <Group>
          <Button variant="light" size="xs" onClick={() => setCorrecting(true)}>
            {t('page.sacs.opening.correct')}
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
            <Image key={p.id} src={photoSrc(p.thumbUrl)} alt={t('page.sacs.opening.photo')} radius="sm" />
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
                setError(isApiError(e) ? e.message : t('page.sacs.opening.photoFailed'));
              }
            }
          }}
          onReject={() => setError(t('page.sacs.opening.photoRefused'))}
          inputProps={{ 'aria-label': t('page.sacs.opening.choosePhotos') }}
        >
          <Text size="sm" ta="center" c="dimmed">
            {t('page.sacs.opening.dropPhotos')}
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

/**
 * The opening of a sac: what was found, once; before that, the form to record it. `urticatingHairs`
 * is what the species' facts say (null when the species is not known): it picks the caution at the form.
 */
export function OpeningPanel({
  sac,
  timeZone,
  canEdit,
  urticatingHairs = null,
}: {
  sac: Pick<SacResponse, 'id' | 'opened'>;
  timeZone: string;
  canEdit: boolean;
  urticatingHairs?: boolean | null;
}) {
  const t = useWords();
  const sacId = sac.id;
  const opening = useOpening(sac);
  if (sac.opened && opening.isPending) return <Text c="dimmed">{t('page.shell.loadingDots')}</Text>;
  if (opening.isError) return <Alert color="clay">{opening.error.message}</Alert>;
  if (opening.data) return <OpeningView opening={opening.data} timeZone={timeZone} sacId={sacId} canEdit={canEdit} />;
  if (!canEdit) return <Text c="dimmed">{t('page.sacs.opening.notYet')}</Text>;
  return <OpeningForm sacId={sacId} timeZone={timeZone} urticatingHairs={urticatingHairs} />;
}

/** Recorded once: the form is checked, then the keeper confirms what will be saved and when the sac was opened. */
function OpeningForm({ sacId, timeZone, urticatingHairs }: { sacId: string; timeZone: string; urticatingHairs: boolean | null }) {
  const t = useWords();
  const record = useRecordOpening(sacId);
  const [message, setMessage] = useState<string | null>(null);
  const [asking, setAsking] = useState<OpeningRequest | null>(null);
  const form = useForm<OpeningValues>({ mode: 'uncontrolled', validateInputOnBlur: true, initialValues: openingValues(), validate: openingRules(t) });
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
          {t('page.sacs.opening.intro')}
        </Text>
        <OpeningCountFields form={form} />
        {warned.warnings && <WarningConfirm warnings={warned.warnings} loading={record.isPending} onConfirm={warned.confirm} onCancel={warned.cancel} />}
        <SafetyNote text={openingCaution(urticatingHairs)} />
        <FormActions message={message} loading={record.isPending} submitLabel={t('page.sacs.opening.save')} />
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
  const t = useWords();
  const when = useWhen(timeZone);
  const viable = counts.healthyEggs + counts.eggsWithLegs + counts.nymphs;
  const about = (n: number) => countText(t, n, !!counts.estimated);
  return (
    <ConfirmAction
      opened
      onClose={onClose}
      title={t('page.sacs.opening.record')}
      confirmLabel={t('page.sacs.opening.record')}
      pending={pending}
      ready={when.instant !== null}
      onConfirm={() => when.instant && onConfirm(when.instant)}
    >
      <Text size="sm">
        {t(counts.keptBack ? 'page.sacs.opening.confirmKept' : 'page.sacs.opening.confirm', {
          viable: about(viable),
          total: about(viable + counts.darkEggs + counts.spoiledEggs),
          keptBack: counts.keptBack,
        })}
      </Text>
      <WhenFields when={when} dateLabel={t('page.sacs.opening.openedOn')} />
    </ConfirmAction>
  );
}

import { Alert, Badge, Group, SegmentedControl, Stack, Table, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import {
  KEPT_BACK_STATE_LABELS,
  TEXT_LIMITS,
  keptBackWords,
  todayIn,
  type KeptBackBatchResponse,
  type KeptBackEndRequest,
  type Words,
} from '@broodsilk/shared';
import { NumberField } from '@/components/fields/number-field';
import { TextAreaField, TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { numberRule, readNumber } from '@/components/fields/typed-number';
import { useWhen, WhenFields } from '@/components/fields/when-fields';
import { ConfirmAction } from '@/components/ui/confirm-action';
import { FormActions } from '@/components/ui/form-actions';
import { ScrollTable } from '@/components/ui/scroll-table';
import { formatDate, formatInstant } from '@/lib/dates';
import { applyServerErrors } from '@/lib/form-errors';
import { catalogueLabels, useWords } from '@/lib/i18n';
import { useEndKeptBack, useKeptBack, useLogKeptBack } from '../api/kept-back';
import { countRule } from '../utils/sac-view';

const KIND_LABELS = catalogueLabels('careLogKind');

/** What an entry of the batch's log did, in words: the care log's own words for a roll and a check. */
const kindWords = (t: Words, kind: KeptBackBatchResponse['log'][number]['kind']): string =>
  kind === 'strike' ? t('page.sacs.keptBack.struckEntry') : KIND_LABELS[kind];

/**
 * The eggs kept back at the opening, as their own batch: its story in plain words, its own log of
 * rolls and checks, and how it ended. Hands-on members log; the owner ends it (joined or written off).
 */
export function KeptBackPanel({ sacId, timeZone, canLog, canEnd }: { sacId: string; timeZone: string; canLog: boolean; canEnd: boolean }) {
  const t = useWords();
  const batch = useKeptBack(sacId, true);
  if (batch.isPending) return <Text c="dimmed">{t('page.shell.loadingDots')}</Text>;
  if (batch.isError) return <Alert color="clay">{batch.error.message}</Alert>;
  const b = batch.data;
  const day = (instant: string) => formatDate(todayIn(timeZone, new Date(instant)));
  const incubating = b.state === 'incubating';
  return (
    <Stack data-testid="kept-back">
      <Group gap="xs">
        <Badge color={b.state === 'written-off' ? 'clay' : b.state === 'joined' ? 'moss' : 'amber'} variant="light" tt="none">
          {KEPT_BACK_STATE_LABELS[b.state]}
        </Badge>
      </Group>
      <Text size="sm" data-testid="kept-back-words">
        {keptBackWords(b, day)}
      </Text>
      {b.log.length > 0 && <KeptBackLog batch={b} timeZone={timeZone} />}
      {incubating && canLog && <LogForm sacId={sacId} timeZone={timeZone} />}
      {incubating && canEnd && <EndForm sacId={sacId} eggs={b.eggs} timeZone={timeZone} />}
    </Stack>
  );
}

function KeptBackLog({ batch, timeZone }: { batch: KeptBackBatchResponse; timeZone: string }) {
  const t = useWords();
  const entryText = (e: KeptBackBatchResponse['log'][number]) => {
    const what = e.note ? t('page.sacs.keptBack.entryNote', { what: kindWords(t, e.kind), note: e.note }) : kindWords(t, e.kind);
    return e.struckBy ? t('page.sacs.keptBack.entryStruck', { entry: what }) : what;
  };
  return (
    <ScrollTable minWidth={360} label={t('page.sacs.keptBack.log')}>
      <Table verticalSpacing={4} fz="sm" aria-label={t('page.sacs.keptBack.log')}>
        <Table.Thead>
          <Table.Tr>
            <Table.Th>{t('page.sacs.columns.when')}</Table.Th>
            <Table.Th>{t('page.sacs.columns.what')}</Table.Th>
            <Table.Th>{t('page.sacs.columns.by')}</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {batch.log.map((e) => (
            <Table.Tr key={e.id} style={e.struckBy ? { textDecoration: 'line-through' } : undefined}>
              <Table.Td>{formatInstant(e.at, timeZone)}</Table.Td>
              <Table.Td>{entryText(e)}</Table.Td>
              <Table.Td>{e.recordedBy?.name ?? '—'}</Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </ScrollTable>
  );
}

/** A roll or a check of the batch, now or at an earlier time. */
function LogForm({ sacId, timeZone }: { sacId: string; timeZone: string }) {
  const t = useWords();
  const log = useLogKeptBack(sacId);
  const when = useWhen(timeZone);
  const [kind, setKind] = useState<'roll' | 'check'>('roll');
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { note: '' },
    validate: { note: textRule({ maxLength: TEXT_LIMITS.note }) },
  });
  const submit = form.onSubmit(async (v) => {
    setMessage(null);
    if (!when.instant) return setMessage(when.error ?? t('page.sacs.keptBack.whenRequired'));
    try {
      await log.mutateAsync({ kind, at: when.instant, note: v.note.trim() || null });
      form.reset();
    } catch (e) {
      setMessage(applyServerErrors(form, e));
    }
  });
  return (
    <form onSubmit={submit} noValidate aria-label={t('page.sacs.keptBack.logForm')}>
      <Stack gap="xs" maw={520}>
        <SegmentedControl
          aria-label={t('page.sacs.keptBack.whatDone')}
          value={kind}
          onChange={(v) => setKind(v as 'roll' | 'check')}
          data={[
            { value: 'roll', label: KIND_LABELS.roll },
            { value: 'check', label: KIND_LABELS.check },
          ]}
        />
        <WhenFields when={when} dateLabel={t('page.sacs.keptBack.day')} timeLabel={t('page.sacs.keptBack.time')} />
        <TextField label={t('page.sacs.keptBack.saw')} maxLength={TEXT_LIMITS.note} key={form.key('note')} {...form.getInputProps('note')} />
        <FormActions
          message={message}
          loading={log.isPending}
          submitLabel={kind === 'roll' ? t('page.sacs.keptBack.saveRoll') : t('page.sacs.keptBack.saveCheck')}
        />
      </Stack>
    </form>
  );
}

interface EndValues {
  outcome: KeptBackEndRequest['outcome'];
  joined: string;
  reason: string;
}

/** Ends the batch for good: counted into the brood (how many) or written off, with a reason, then asks once with the time. */
function EndForm({ sacId, eggs, timeZone }: { sacId: string; eggs: number; timeZone: string }) {
  const t = useWords();
  const end = useEndKeptBack(sacId);
  const [message, setMessage] = useState<string | null>(null);
  const [asking, setAsking] = useState<KeptBackEndRequest | null>(null);
  const form = useForm<EndValues>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { outcome: 'written-off', joined: '', reason: '' },
    validate: {
      joined: (v, values) => (values.outcome === 'joined' ? numberRule({ required: t('page.sacs.keptBack.joinedRequired'), ...countRule(t, eggs) })(v) : null),
      reason: textRule({ required: t('page.sacs.keptBack.whyRequired'), maxLength: TEXT_LIMITS.correctionReason }),
    },
  });
  const [outcome, setOutcome] = useState<EndValues['outcome']>('written-off');
  form.watch('outcome', ({ value }) => setOutcome(value));
  const submit = form.onSubmit((v) => {
    setMessage(null);
    setAsking({ outcome: v.outcome, reason: v.reason.trim(), ...(v.outcome === 'joined' ? { joined: readNumber(v.joined)! } : {}) });
  });
  return (
    <form onSubmit={submit} noValidate aria-label={t('page.sacs.keptBack.endForm')}>
      <Stack gap="xs" maw={520}>
        <Text size="sm" fw={500}>
          {t('page.sacs.keptBack.endQuestion')}
        </Text>
        <SegmentedControl
          aria-label={t('page.sacs.keptBack.outcome')}
          data={[
            { value: 'written-off', label: KEPT_BACK_STATE_LABELS['written-off'] },
            { value: 'joined', label: KEPT_BACK_STATE_LABELS.joined },
          ]}
          key={form.key('outcome')}
          {...form.getInputProps('outcome')}
        />
        {outcome === 'joined' && (
          <NumberField label={t('page.sacs.keptBack.howManyJoined', { eggs })} whole key={form.key('joined')} {...form.getInputProps('joined')} />
        )}
        <TextAreaField
          label={t('page.sacs.keptBack.why')}
          maxLength={TEXT_LIMITS.correctionReason}
          key={form.key('reason')}
          {...form.getInputProps('reason')}
        />
        <FormActions
          message={message}
          loading={end.isPending}
          submitLabel={outcome === 'joined' ? t('page.sacs.keptBack.countIn') : t('page.sacs.keptBack.writeOff')}
        />
      </Stack>
      {asking && (
        <ConfirmEnd
          request={asking}
          eggs={eggs}
          timeZone={timeZone}
          pending={end.isPending}
          onClose={() => setAsking(null)}
          onConfirm={async (at) => {
            try {
              await end.mutateAsync({ ...asking, at });
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

function ConfirmEnd(props: {
  request: KeptBackEndRequest;
  eggs: number;
  timeZone: string;
  pending: boolean;
  onClose: () => void;
  onConfirm: (at: string) => void;
}) {
  const t = useWords();
  const when = useWhen(props.timeZone);
  const { request: r, eggs } = props;
  return (
    <ConfirmAction
      opened
      onClose={props.onClose}
      title={r.outcome === 'joined' ? t('page.sacs.keptBack.countInTitle') : t('page.sacs.keptBack.writeOff')}
      confirmLabel={r.outcome === 'joined' ? t('page.sacs.keptBack.countIn') : t('page.sacs.keptBack.writeOff')}
      pending={props.pending}
      ready={when.instant !== null}
      onConfirm={() => when.instant && props.onConfirm(when.instant)}
    >
      <Text size="sm">
        {r.outcome === 'joined'
          ? t('page.sacs.keptBack.confirmJoined', { count: eggs, joined: r.joined })
          : t('page.sacs.keptBack.confirmWrittenOff', { count: eggs })}
      </Text>
      <WhenFields when={when} dateLabel={t('page.shell.fields.on')} />
    </ConfirmAction>
  );
}

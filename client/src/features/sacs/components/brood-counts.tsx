import { Alert, Button, Checkbox, Collapse, Group, Select, SimpleGrid, Stack, Table, Text } from '@mantine/core';
import { NumberField } from '@/components/fields/number-field';
import { TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { numberRule, readNumber } from '@/components/fields/typed-number';
import { ScrollTable } from '@/components/ui/scroll-table';
import { useForm } from '@mantine/form';
import { useDisclosure } from '@mantine/hooks';
import { useState } from 'react';
import { BROOD_LOSS_REASONS, BROOD_STAGES, TEXT_LIMITS, type BroodCountRequest, type BroodLossReason, type BroodStage } from '@broodsilk/shared';
import { formatInstant } from '@/lib/dates';
import { applyServerErrors } from '@/lib/form-errors';
import { useBroodCounts, useRecordBroodCount } from '../api/brood';
import { broodLabel, countRule, countText, midSentence } from '../utils/sac-view';
import { catalogueLabels, useWords } from '@/lib/i18n';
import { FormActions } from '@/components/ui/form-actions';
import { WarningConfirm, useWarnedSave } from '@/components/ui/warning-confirm';
import { CountCorrection } from './count-correction';

const LOSS_LABELS = catalogueLabels('broodLoss');

const stageOptions = () => BROOD_STAGES.map((s) => ({ value: s, label: broodLabel(s) }));
const lossOptions = () => BROOD_LOSS_REASONS.map((r) => ({ value: r, label: LOSS_LABELS[r] }));

interface Values {
  stage: BroodStage;
  alive: string;
  estimated: boolean;
  lost: string;
  lossReason: BroodLossReason | null;
  note: string;
}

/** The brood's counts over time, and a form to record a new count. */
export function BroodCounts({ sacId, timeZone, canRecord, stage }: { sacId: string; timeZone: string; canRecord: boolean; stage: BroodStage }) {
  const t = useWords();
  const counts = useBroodCounts(sacId);
  const record = useRecordBroodCount(sacId);
  const [opened, { toggle, close }] = useDisclosure(false);
  const [message, setMessage] = useState<string | null>(null);
  const [correcting, setCorrecting] = useState<string | null>(null);
  const form = useForm<Values>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { stage, alive: '', estimated: false, lost: '0', lossReason: null, note: '' },
    validate: {
      alive: numberRule({ required: t('page.sacs.brood.aliveRequired'), ...countRule(t) }),
      lost: numberRule(countRule(t)),
      lossReason: (v, values) => ((readNumber(values.lost) ?? 0) > 0 && !v ? t('page.sacs.brood.lossReasonRequired') : null),
      note: textRule({ maxLength: TEXT_LIMITS.note }),
    },
  });
  const warned = useWarnedSave(
    (body: BroodCountRequest) => record.mutateAsync(body),
    () => {
      form.reset();
      close();
    },
    (e) => setMessage(applyServerErrors(form, e)),
  );
  const submit = form.onSubmit((v) => {
    setMessage(null);
    return warned.save({
      stage: v.stage,
      alive: readNumber(v.alive)!,
      estimated: v.estimated,
      lost: readNumber(v.lost) ?? 0,
      ...((readNumber(v.lost) ?? 0) > 0 && v.lossReason ? { lossReason: v.lossReason } : {}),
      note: v.note.trim() || null,
    });
  });
  return (
    <Stack>
      {counts.isError && <Alert color="clay">{counts.error.message}</Alert>}
      {counts.data && counts.data.counts.length === 0 && <Text c="dimmed">{t('page.sacs.brood.none')}</Text>}
      {counts.data && counts.data.counts.length > 0 && (
        <>
          <Text size="sm">
            {t('page.sacs.brood.aliveNow')} <b>{counts.data.current === null ? '—' : countText(t, counts.data.current, counts.data.currentEstimated)}</b>
            {counts.data.currentEstimated && ` ${t('page.sacs.brood.estimateNote')}`}
          </Text>
          <ScrollTable minWidth={360} label={t('page.sacs.brood.table')}>
            <Table verticalSpacing={4} fz="sm" data-testid="brood-counts">
              <Table.Thead>
                <Table.Tr>
                  <Table.Th>{t('page.sacs.columns.when')}</Table.Th>
                  <Table.Th>{t('page.sacs.columns.stage')}</Table.Th>
                  <Table.Th>{t('page.sacs.columns.alive')}</Table.Th>
                  <Table.Th>{t('page.sacs.columns.lost')}</Table.Th>
                  {canRecord && <Table.Th>{t('page.sacs.columns.correct')}</Table.Th>}
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {[...counts.data.counts]
                  .sort((a, b) => (a.at < b.at ? 1 : -1))
                  .map((c) => (
                    <Table.Tr key={c.id} data-testid={c.struckBy ? 'count-struck' : 'count'}>
                      <Table.Td style={c.struckBy ? { textDecoration: 'line-through' } : undefined}>{formatInstant(c.at, timeZone)}</Table.Td>
                      <Table.Td>{broodLabel(c.stage)}</Table.Td>
                      <Table.Td>
                        <Text span size="sm" style={c.struckBy ? { textDecoration: 'line-through' } : undefined}>
                          {countText(t, c.alive, c.estimated)}
                        </Text>
                        {c.struckBy ? ` ${t('page.sacs.brood.struck')}` : ''}
                        {c.reason && (
                          <Text size="xs" c="dimmed">
                            {t('page.sacs.brood.correction', { reason: c.reason })}
                          </Text>
                        )}
                      </Table.Td>
                      <Table.Td>
                        {c.lost > 0 ? (
                          <Text size="sm" className="tone-failed">
                            {c.lossReason ? t('page.sacs.brood.lostWith', { lost: c.lost, reason: midSentence(LOSS_LABELS[c.lossReason]) }) : c.lost}
                          </Text>
                        ) : (
                          '—'
                        )}
                      </Table.Td>
                      {canRecord && (
                        <Table.Td>
                          {!c.struckBy && c.source === 'count' && (
                            <Button
                              variant="subtle"
                              size="compact-xs"
                              onClick={() => setCorrecting(c.id)}
                              aria-label={t('page.sacs.brood.correctCountOf', { at: formatInstant(c.at, timeZone) })}
                            >
                              {t('page.sacs.columns.correct')}
                            </Button>
                          )}
                          {!c.struckBy && c.source === 'opening' && (
                            <Text size="xs" c="dimmed">
                              {t('page.sacs.opening.correct')}
                            </Text>
                          )}
                        </Table.Td>
                      )}
                    </Table.Tr>
                  ))}
              </Table.Tbody>
            </Table>
          </ScrollTable>
          {correcting && counts.data.counts.some((c) => c.id === correcting) && (
            <CountCorrection count={counts.data.counts.find((c) => c.id === correcting)!} timeZone={timeZone} onDone={() => setCorrecting(null)} />
          )}
        </>
      )}
      {canRecord && (
        <>
          <Group>
            <Button variant="light" onClick={toggle}>
              {opened ? t('page.sacs.close') : t('page.sacs.brood.recordCount')}
            </Button>
          </Group>
          <Collapse expanded={opened}>
            <form onSubmit={submit} noValidate>
              <Stack maw={520}>
                <SimpleGrid cols={{ base: 2, sm: 4 }}>
                  <Select
                    label={t('page.sacs.columns.stage')}
                    description={t('page.sacs.brood.stageHint')}
                    data={stageOptions()}
                    allowDeselect={false}
                    key={form.key('stage')}
                    {...form.getInputProps('stage')}
                  />
                  <NumberField label={t('page.sacs.columns.alive')} whole key={form.key('alive')} {...form.getInputProps('alive')} />
                  <Checkbox label={t('page.sacs.brood.estimate')} key={form.key('estimated')} {...form.getInputProps('estimated', { type: 'checkbox' })} />
                  <NumberField label={t('page.sacs.columns.lost')} whole key={form.key('lost')} {...form.getInputProps('lost')} />
                  <Select label={t('page.sacs.brood.lostBecause')} data={lossOptions()} key={form.key('lossReason')} {...form.getInputProps('lossReason')} />
                </SimpleGrid>
                <TextField label={t('page.sacs.entry.note')} maxLength={TEXT_LIMITS.note} key={form.key('note')} {...form.getInputProps('note')} />
                {warned.warnings && (
                  <WarningConfirm warnings={warned.warnings} loading={record.isPending} onConfirm={warned.confirm} onCancel={warned.cancel} />
                )}
                <FormActions message={message} loading={record.isPending} submitLabel={t('page.sacs.brood.save')} />
              </Stack>
            </form>
          </Collapse>
        </>
      )}
    </Stack>
  );
}

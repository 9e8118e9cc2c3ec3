import { Alert, Button, Checkbox, Collapse, Group, Select, SimpleGrid, Stack, Table, Text } from '@mantine/core';
import { NumberField } from '@/components/fields/number-field';
import { TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { numberRule, readNumber } from '@/components/fields/typed-number';
import { ScrollTable } from '@/components/ui/scroll-table';
import { useForm } from '@mantine/form';
import { useDisclosure } from '@mantine/hooks';
import { useState } from 'react';
import {
  BROOD_COUNT_MAX,
  BROOD_LOSS_REASONS,
  BROOD_STAGES,
  TEXT_LIMITS,
  countWords,
  type BroodCountRequest,
  type BroodLossReason,
  type BroodStage,
} from '@broodsilk/shared';
import { formatInstant } from '@/lib/dates';
import { applyServerErrors } from '@/lib/form-errors';
import { useBroodCounts, useRecordBroodCount } from '../api/brood';
import { broodLabel } from '../utils/sac-view';
import { catalogueLabels } from '@/lib/i18n';
import { FormActions } from '@/components/ui/form-actions';
import { WarningConfirm, useWarnedSave } from '@/components/ui/warning-confirm';
import { CountCorrection } from './count-correction';

const LOSS_LABELS = catalogueLabels('broodLoss');

const COUNT = { min: 0, max: BROOD_COUNT_MAX, decimals: 0, rangeMessage: `A whole number from 0 to ${BROOD_COUNT_MAX}.` };

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
      alive: numberRule({ required: 'How many are alive?', ...COUNT }),
      lost: numberRule(COUNT),
      lossReason: (v, values) => ((readNumber(values.lost) ?? 0) > 0 && !v ? 'Why were they lost?' : null),
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
      {counts.data && counts.data.counts.length === 0 && <Text c="dimmed">No counts yet; the opening gives the first one.</Text>}
      {counts.data && counts.data.counts.length > 0 && (
        <>
          <Text size="sm">
            Alive now: <b>{counts.data.current === null ? '—' : countWords(counts.data.current, counts.data.currentEstimated)}</b>
            {counts.data.currentEstimated && ' (an estimate: shares from it are provisional)'}
          </Text>
          <ScrollTable minWidth={360} label="Brood counts">
            <Table verticalSpacing={4} fz="sm" data-testid="brood-counts">
              <Table.Thead>
                <Table.Tr>
                  <Table.Th>When</Table.Th>
                  <Table.Th>Stage</Table.Th>
                  <Table.Th>Alive</Table.Th>
                  <Table.Th>Lost</Table.Th>
                  {canRecord && <Table.Th>Correct</Table.Th>}
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
                          {countWords(c.alive, c.estimated)}
                        </Text>
                        {c.struckBy ? ' (struck: corrected)' : ''}
                        {c.reason && (
                          <Text size="xs" c="dimmed">
                            Correction: {c.reason}
                          </Text>
                        )}
                      </Table.Td>
                      <Table.Td>
                        {c.lost > 0 ? (
                          <Text size="sm" className="tone-failed">
                            {c.lost}
                            {c.lossReason ? ` (${LOSS_LABELS[c.lossReason].toLowerCase()})` : ''}
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
                              aria-label={`Correct the count of ${formatInstant(c.at, timeZone)}`}
                            >
                              Correct
                            </Button>
                          )}
                          {!c.struckBy && c.source === 'opening' && (
                            <Text size="xs" c="dimmed">
                              Correct the opening
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
              {opened ? 'Close' : 'Record a count'}
            </Button>
          </Group>
          <Collapse expanded={opened}>
            <form onSubmit={submit} noValidate>
              <Stack maw={520}>
                <SimpleGrid cols={{ base: 2, sm: 4 }}>
                  <Select
                    label="Stage"
                    description="The sac's stage; a later one moves it"
                    data={stageOptions()}
                    allowDeselect={false}
                    key={form.key('stage')}
                    {...form.getInputProps('stage')}
                  />
                  <NumberField label="Alive" whole key={form.key('alive')} {...form.getInputProps('alive')} />
                  <Checkbox
                    label="An estimate, not counted one by one"
                    key={form.key('estimated')}
                    {...form.getInputProps('estimated', { type: 'checkbox' })}
                  />
                  <NumberField label="Lost" whole key={form.key('lost')} {...form.getInputProps('lost')} />
                  <Select label="Lost because" data={lossOptions()} key={form.key('lossReason')} {...form.getInputProps('lossReason')} />
                </SimpleGrid>
                <TextField label="Note" maxLength={TEXT_LIMITS.note} key={form.key('note')} {...form.getInputProps('note')} />
                {warned.warnings && (
                  <WarningConfirm warnings={warned.warnings} loading={record.isPending} onConfirm={warned.confirm} onCancel={warned.cancel} />
                )}
                <FormActions message={message} loading={record.isPending} submitLabel="Save count" />
              </Stack>
            </form>
          </Collapse>
        </>
      )}
    </Stack>
  );
}

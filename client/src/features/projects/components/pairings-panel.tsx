import { Alert, Badge, Button, Collapse, Group, Select, Stack, Table, Text } from '@mantine/core';
import { TimeInput } from '@mantine/dates';
import '@mantine/dates/styles.css';
import { DateField } from '@/components/fields/date-field';
import { NumberField } from '@/components/fields/number-field';
import { TextAreaField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { dateRule, readDate } from '@/components/fields/typed-date';
import { numberRule, readNumber } from '@/components/fields/typed-number';
import { useForm } from '@mantine/form';
import { useDisclosure } from '@mantine/hooks';
import { useState } from 'react';
import { PAIRING_OUTCOMES, TEXT_LIMITS, todayIn, type CreatePairingRequest, type PairingOutcome } from '@broodsilk/shared';
import { dayjs, formatInstant } from '@/lib/dates';
import { applyServerErrors } from '@/lib/form-errors';
import { usePairings, useRecordPairing } from '../api/pairings';
import { PAIRING_OUTCOME_LABELS } from '../utils/labels';
import { FormActions } from '@/components/ui/form-actions';
import { SafetyNote } from '@/components/ui/safety-note';
import { WarningConfirm, useWarnedSave } from '@/components/ui/warning-confirm';

const outcomeOptions = PAIRING_OUTCOMES.map((o) => ({ value: o, label: PAIRING_OUTCOME_LABELS[o] }));

interface Values {
  on: string;
  time: string;
  durationMinutes: string;
  outcome: PairingOutcome;
  notes: string;
}

/** Pairing attempts of a project and, for the keeper, a form to record one. */
export function PairingsPanel({ projectId, timeZone, canRecord }: { projectId: string; timeZone: string; canRecord: boolean }) {
  const today = todayIn(timeZone, new Date());
  const pairings = usePairings(projectId);
  const record = useRecordPairing(projectId);
  const [opened, { toggle, close }] = useDisclosure(false);
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<Values>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { on: '', time: '20:00', durationMinutes: '20', outcome: 'connected', notes: '' },
    validate: {
      on: dateRule({ required: 'On which day was the male put in?', latest: today, latestMessage: 'A pairing that has happened cannot be in the future.' }),
      time: (v) => (/^\d{2}:\d{2}$/.test(v) ? null : 'The time as HH:MM.'),
      durationMinutes: numberRule({
        required: 'How many minutes?',
        min: 1,
        max: 20_160,
        decimals: 0,
        rangeMessage: 'From 1 minute to 14 days (20160 minutes).',
      }),
      notes: textRule({ maxLength: TEXT_LIMITS.note }),
    },
  });

  const warned = useWarnedSave(
    (body: CreatePairingRequest) => record.mutateAsync(body),
    () => {
      form.reset();
      close();
    },
    (e) => setMessage(applyServerErrors(form, e)),
  );
  const submit = form.onSubmit((v) => {
    setMessage(null);
    // Day and wall-clock time are read in the keeper's own zone.
    const startedAt = dayjs.tz(`${readDate(v.on)}T${v.time}`, timeZone).toISOString();
    return warned.save({ startedAt, durationMinutes: readNumber(v.durationMinutes)!, outcome: v.outcome, notes: v.notes.trim() || null });
  });

  return (
    <Stack>
      {pairings.isError && <Alert color="clay">{pairings.error.message}</Alert>}
      {pairings.data && pairings.data.length === 0 && <Text c="dimmed">No pairing recorded yet.</Text>}
      {pairings.data && pairings.data.length > 0 && (
        <Table.ScrollContainer minWidth={300}>
          <Table striped verticalSpacing={4} fz="sm" data-testid="pairings-table">
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Started</Table.Th>
                <Table.Th visibleFrom="sm">Minutes</Table.Th>
                <Table.Th>Outcome</Table.Th>
                <Table.Th visibleFrom="sm">Notes</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {pairings.data.map((p) => (
                <Table.Tr key={p.id}>
                  <Table.Td>{formatInstant(p.startedAt, timeZone)}</Table.Td>
                  <Table.Td visibleFrom="sm">{p.durationMinutes}</Table.Td>
                  <Table.Td>
                    <Badge variant="light" tt="none" color={p.outcome === 'connected' ? 'moss' : p.outcome === 'interest-only' ? 'gray' : 'clay'}>
                      {PAIRING_OUTCOME_LABELS[p.outcome]}
                    </Badge>
                  </Table.Td>
                  <Table.Td visibleFrom="sm">{p.notes ?? ''}</Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        </Table.ScrollContainer>
      )}
      {canRecord && (
        <>
          <Group>
            <Button variant="light" onClick={toggle}>
              {opened ? 'Close' : 'Record a pairing'}
            </Button>
          </Group>
          <Collapse expanded={opened}>
            <form onSubmit={submit} noValidate>
              <Stack maw={480}>
                <Group grow align="flex-start">
                  <DateField label="Day the male went in" withAsterisk key={form.key('on')} {...form.getInputProps('on')} />
                  <TimeInput label="At" key={form.key('time')} {...form.getInputProps('time')} />
                </Group>
                <NumberField label="How long (minutes)" whole key={form.key('durationMinutes')} {...form.getInputProps('durationMinutes')} />
                <Select label="Outcome" data={outcomeOptions} allowDeselect={false} key={form.key('outcome')} {...form.getInputProps('outcome')} />
                <TextAreaField label="Notes" maxLength={TEXT_LIMITS.note} key={form.key('notes')} {...form.getInputProps('notes')} />
                {warned.warnings && (
                  <WarningConfirm warnings={warned.warnings} loading={record.isPending} onConfirm={warned.confirm} onCancel={warned.cancel} />
                )}
                <SafetyNote text="pairing" />
                <FormActions message={message} loading={record.isPending} submitLabel="Save pairing" />
              </Stack>
            </form>
          </Collapse>
        </>
      )}
    </Stack>
  );
}

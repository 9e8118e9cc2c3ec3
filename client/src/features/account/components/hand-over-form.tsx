import { Alert, Group, List, NativeSelect, SegmentedControl, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { dateRule, readDate } from '@/components/fields/typed-date';
import { numberRule, readNumber } from '@/components/fields/typed-number';
import { FormActions } from '@/components/ui/form-actions';
import { SafetyNote } from '@/components/ui/safety-note';
import { TEXT_LIMITS, type HandOverMethod, type SacSharesView } from '@broodsilk/shared';
import { useCreateEntry, useHandOverForm } from '../api/entries';
import { SacCountDateFields } from './sac-count-date-fields';
import { applyEntryErrors } from '../utils/entry-errors';
import { METHOD_LABELS, young } from '../utils/labels';

interface Values {
  memberId: string;
  sacId: string;
  count: string;
  date: string;
  method: HandOverMethod;
  carrier: string;
  tracking: string;
  note: string;
}

/** The owner records spiderlings delivered to a party, by pick-up or shipment. */
export function HandOverForm({ projectId, today, sacs, onDone }: { projectId: string; today: string; sacs: SacSharesView[]; onDone?: () => void }) {
  const info = useHandOverForm(projectId);
  const create = useCreateEntry(projectId);
  const [message, setMessage] = useState<string | null>(null);
  const [method, setMethod] = useState<HandOverMethod>('pick-up');
  const withYoung = sacs.filter((s) => s.aliveInCare > 0);
  const form = useForm<Values>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { memberId: '', sacId: '', count: '', date: today, method: 'pick-up', carrier: '', tracking: '', note: '' },
    validate: {
      memberId: (v) => (v ? null : 'Who receives the spiderlings?'),
      count: numberRule({ required: 'How many spiderlings?', min: 1, max: 100_000, decimals: 0, rangeMessage: 'A count is a whole number from 1 to 100,000.' }),
      date: dateRule({ required: 'Give the date.', latest: today, latestMessage: 'This has happened, so it cannot be after today.' }),
      sacId: (v) => (withYoung.length > 1 && !v ? 'Several sacs have young in care: which one?' : null),
      carrier: textRule({ maxLength: TEXT_LIMITS.carrier }),
      tracking: textRule({ maxLength: TEXT_LIMITS.tracking }),
      note: textRule({ maxLength: TEXT_LIMITS.ledgerNote }),
    },
  });
  form.watch('method', ({ value }) => setMethod(value));

  const submit = form.onSubmit(async (v) => {
    setMessage(null);
    try {
      await create.mutateAsync({
        kind: 'hand-over',
        memberId: v.memberId,
        sacId: v.sacId || undefined,
        count: readNumber(v.count)!,
        date: readDate(v.date)!,
        method: v.method,
        carrier: v.method === 'shipment' && v.carrier.trim() ? v.carrier.trim() : undefined,
        tracking: v.method === 'shipment' && v.tracking.trim() ? v.tracking.trim() : undefined,
        note: v.note.trim() || undefined,
      });
      form.reset();
      onDone?.();
    } catch (e) {
      setMessage(applyEntryErrors(form, e));
    }
  });

  if (info.isPending) return <Text c="dimmed">Loading…</Text>;
  if (info.isError) return <Alert color="clay">{info.error.message}</Alert>;
  const partyOptions = [
    { value: '', label: 'Choose a party' },
    ...info.data.parties.map((p) => ({ value: p.memberId, label: `${p.name} (${young(p.owedSpiderlings)} still owed)` })),
  ];

  return (
    <form onSubmit={submit} noValidate aria-label="Record a hand-over">
      <Stack maw={520} gap="sm">
        {info.data.handOverStage && (
          <Text size="sm" c="dimmed">
            The terms hand young over at {info.data.handOverStage}
            {info.data.shippingPaidBy ? `; shipping is paid by ${info.data.shippingPaidBy}` : ''}.
          </Text>
        )}
        <NativeSelect label="To" data={partyOptions} withAsterisk key={form.key('memberId')} {...form.getInputProps('memberId')} />
        <SacCountDateFields
          withYoung={withYoung}
          sac={{ key: form.key('sacId'), ...form.getInputProps('sacId') }}
          count={{ key: form.key('count'), ...form.getInputProps('count') }}
          date={{ key: form.key('date'), ...form.getInputProps('date') }}
        />
        <Stack gap={4}>
          <Text size="sm" fw={500} id="hand-over-method">
            How
          </Text>
          <SegmentedControl
            aria-labelledby="hand-over-method"
            data={info.data.methods.map((m) => ({ value: m, label: METHOD_LABELS[m] }))}
            key={form.key('method')}
            {...form.getInputProps('method')}
          />
        </Stack>
        {method === 'shipment' && (
          <>
            <Group grow align="flex-start">
              <TextField label="Carrier" maxLength={TEXT_LIMITS.carrier} key={form.key('carrier')} {...form.getInputProps('carrier')} />
              <TextField label="Tracking number" maxLength={TEXT_LIMITS.tracking} key={form.key('tracking')} {...form.getInputProps('tracking')} />
            </Group>
            <Alert color="amber" variant="light" title="Before you ship live spiderlings" role="note" data-testid="shipping-cautions">
              <List size="sm" spacing={4}>
                {info.data.shippingCautions.map((c) => (
                  <List.Item key={c}>{c}</List.Item>
                ))}
              </List>
            </Alert>
          </>
        )}
        <TextField label="Note" maxLength={TEXT_LIMITS.ledgerNote} key={form.key('note')} {...form.getInputProps('note')} />
        <SafetyNote text="crossBorder" />
        <FormActions message={message} loading={create.isPending} submitLabel="Record hand-over" />
      </Stack>
    </form>
  );
}

import { Group, NativeSelect, Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { DateField } from '@/components/fields/date-field';
import { NumberField } from '@/components/fields/number-field';
import { TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { dateRule, readDate } from '@/components/fields/typed-date';
import { FormActions } from '@/components/ui/form-actions';
import { TEXT_LIMITS, minorToMajor, parseMoney, toMinor, type PartyRef } from '@broodsilk/shared';
import { useCreateEntry } from '../api/entries';
import { applyEntryErrors } from '../utils/entry-errors';

interface Values {
  fromMemberId: string;
  toMemberId: string;
  amount: string;
  date: string;
  note: string;
}

interface Props {
  projectId: string;
  parties: PartyRef[];
  currency: string;
  today: string;
  /** A partner records only what they paid: the payer is fixed. */
  fromMemberId?: string;
  toMemberId?: string;
  amountMinor?: number;
  submitLabel?: string;
  onDone?: () => void;
}

/** Money paid from one party to another; the other party confirms it before it counts. */
export function MoneyForm({ projectId, parties, currency, today, fromMemberId, toMemberId, amountMinor, submitLabel = 'Record payment', onDone }: Props) {
  const create = useCreateEntry(projectId);
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<Values>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: {
      fromMemberId: fromMemberId ?? '',
      toMemberId: toMemberId ?? '',
      amount: amountMinor ? String(minorToMajor(amountMinor, currency)) : '',
      date: today,
      note: '',
    },
    validate: {
      fromMemberId: (v) => (v ? null : 'Who paid?'),
      toMemberId: (v, all) => (!v ? 'Who was paid?' : v === all.fromMemberId ? 'The payer and the payee must be different parties.' : null),
      amount: (v) => {
        const amount = parseMoney(v, currency);
        return !amount.ok ? amount.message : amount.minor > 0 ? null : 'The amount must be above 0.';
      },
      note: textRule({ maxLength: TEXT_LIMITS.ledgerNote }),
      date: dateRule({ required: 'Give the date.', latest: today, latestMessage: 'This has happened, so it cannot be after today.' }),
    },
  });
  const submit = form.onSubmit(async (v) => {
    setMessage(null);
    try {
      await create.mutateAsync({
        kind: 'money',
        fromMemberId: v.fromMemberId,
        toMemberId: v.toMemberId,
        amountMinor: toMinor(v.amount, currency),
        currency,
        date: readDate(v.date)!,
        note: v.note.trim() || undefined,
      });
      form.reset();
      onDone?.();
    } catch (e) {
      setMessage(applyEntryErrors(form, e, 'amount'));
    }
  });
  const options = [{ value: '', label: 'Choose a party' }, ...parties.map((p) => ({ value: p.memberId, label: p.name }))];
  return (
    <form onSubmit={submit} noValidate aria-label="Record a payment">
      <Stack maw={520} gap="sm">
        <Group grow align="flex-start">
          <NativeSelect
            label="Paid by"
            data={options}
            disabled={fromMemberId !== undefined}
            key={form.key('fromMemberId')}
            {...form.getInputProps('fromMemberId')}
          />
          <NativeSelect label="Paid to" data={options} disabled={toMemberId !== undefined} key={form.key('toMemberId')} {...form.getInputProps('toMemberId')} />
        </Group>
        <Group grow align="flex-start">
          <NumberField label={`Amount (${currency})`} withAsterisk key={form.key('amount')} {...form.getInputProps('amount')} />
          <DateField label="Date" withAsterisk key={form.key('date')} {...form.getInputProps('date')} />
        </Group>
        <TextField label="Note" placeholder="e.g. bank transfer" maxLength={TEXT_LIMITS.ledgerNote} key={form.key('note')} {...form.getInputProps('note')} />
        <FormActions message={message} loading={create.isPending} submitLabel={submitLabel} />
      </Stack>
    </form>
  );
}

import { Alert, Button, Group, NativeSelect, NumberInput, Stack, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { minorDigits, minorToMajor, parseMoney, toMinor, type PartyRef } from '@broodsilk/shared';
import { useCreateEntry } from '../api/entries';
import { applyEntryErrors } from '../utils/entry-errors';

interface Values {
  fromMemberId: string;
  toMemberId: string;
  amount: number | string;
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
    initialValues: {
      fromMemberId: fromMemberId ?? '',
      toMemberId: toMemberId ?? '',
      amount: amountMinor ? minorToMajor(amountMinor, currency) : '',
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
      date: (v) => (/^\d{4}-\d{2}-\d{2}$/.test(v) ? null : 'Give the date as YYYY-MM-DD.'),
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
        date: v.date,
        note: v.note.trim() || undefined,
      });
      form.reset();
      onDone?.();
    } catch (e) {
      setMessage(applyEntryErrors(form, e, 'amount'));
    }
  });
  const options = [{ value: '', label: 'Choose a party' }, ...parties.map((p) => ({ value: p.memberId, label: p.name }))];
  const digits = minorDigits(currency);
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
          <NumberInput
            label={`Amount (${currency})`}
            min={0}
            decimalScale={digits}
            allowDecimal={digits > 0}
            withAsterisk
            key={form.key('amount')}
            {...form.getInputProps('amount')}
          />
          <TextInput label="Date" type="date" max={today} withAsterisk key={form.key('date')} {...form.getInputProps('date')} />
        </Group>
        <TextInput label="Note" placeholder="e.g. bank transfer" key={form.key('note')} {...form.getInputProps('note')} />
        {message && (
          <Alert color="clay" role="alert">
            {message}
          </Alert>
        )}
        <Group>
          <Button type="submit" loading={create.isPending}>
            {submitLabel}
          </Button>
        </Group>
      </Stack>
    </form>
  );
}

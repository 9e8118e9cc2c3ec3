import { Alert, Button, Group, NativeSelect, NumberInput, Stack, Text, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { minorDigits, parseMoney, toMinor, type PartyBalanceView, type SacSharesView } from '@broodsilk/shared';
import { formatDate } from '@/lib/dates';
import { useCreateEntry } from '../api/entries';
import { applyEntryErrors } from '../utils/entry-errors';
import { young } from '../utils/labels';

interface Values {
  memberId: string;
  sacId: string;
  count: number | string;
  date: string;
  price: number | string;
  note: string;
}

interface Props {
  projectId: string;
  kind: 'sale' | 'cash-out';
  parties: PartyBalanceView[];
  sacs: SacSharesView[];
  currency: string;
  /** The terms' price per spiderling, for the cash-out hint. */
  termsPriceMinor: number | null;
  today: string;
  onDone?: () => void;
}

/** A sale to an outside buyer, or a cash-out (money instead of young): both take young off a party's share. */
export function WithdrawalForm({ projectId, kind, parties, sacs, currency, termsPriceMinor, today, onDone }: Props) {
  const create = useCreateEntry(projectId);
  const [message, setMessage] = useState<string | null>(null);
  const withYoung = sacs.filter((s) => s.aliveInCare > 0);
  const sale = kind === 'sale';
  const form = useForm<Values>({
    mode: 'uncontrolled',
    initialValues: { memberId: '', sacId: '', count: '', date: today, price: '', note: '' },
    validate: {
      memberId: (v) => (v ? null : 'Whose share is this from?'),
      count: (v) => (Number.isInteger(Number(v)) && Number(v) > 0 ? null : 'How many spiderlings? A whole number above 0.'),
      date: (v) => (/^\d{4}-\d{2}-\d{2}$/.test(v) ? null : 'Give the date as YYYY-MM-DD.'),
      sacId: (v) => (withYoung.length > 1 && !v ? 'Several sacs have young in care: which one?' : null),
      price: (v) => {
        if (v === '' || v === null) return sale ? 'What was the total price?' : null;
        const price = parseMoney(v, currency);
        return !price.ok ? price.message : price.minor >= 0 ? null : 'The price must be 0 or more.';
      },
    },
  });
  const submit = form.onSubmit(async (v) => {
    setMessage(null);
    const price = v.price === '' ? undefined : toMinor(v.price, currency);
    try {
      await create.mutateAsync({
        kind,
        memberId: v.memberId,
        sacId: v.sacId || undefined,
        count: Number(v.count),
        date: v.date,
        ...(sale ? { priceMinor: price, currency } : { pricePerSpiderlingMinor: price }),
        note: v.note.trim() || undefined,
      });
      form.reset();
      onDone?.();
    } catch (e) {
      setMessage(applyEntryErrors(form, e));
    }
  });
  const digits = minorDigits(currency);
  return (
    <form onSubmit={submit} noValidate aria-label={sale ? 'Record a sale' : 'Record a cash-out'}>
      <Stack maw={520} gap="sm">
        <NativeSelect
          label={sale ? 'Sold from the share of' : 'Cashed out by'}
          data={[
            { value: '', label: 'Choose a party' },
            ...parties.map((p) => ({ value: p.memberId, label: `${p.name} (${young(p.owedSpiderlings)} still owed)` })),
          ]}
          withAsterisk
          key={form.key('memberId')}
          {...form.getInputProps('memberId')}
        />
        {withYoung.length > 1 && (
          <NativeSelect
            label="From the sac"
            data={[
              { value: '', label: 'Choose a sac' },
              ...withYoung.map((s) => ({ value: s.sacId, label: `Laid ${formatDate(s.layDate)} (${s.aliveInCare} in care)` })),
            ]}
            key={form.key('sacId')}
            {...form.getInputProps('sacId')}
          />
        )}
        <Group grow align="flex-start">
          <NumberInput label="Count" min={1} allowDecimal={false} withAsterisk key={form.key('count')} {...form.getInputProps('count')} />
          <TextInput label="Date" type="date" max={today} withAsterisk key={form.key('date')} {...form.getInputProps('date')} />
        </Group>
        <NumberInput
          label={sale ? `Total price (${currency})` : `Price per spiderling (${currency})`}
          description={!sale && termsPriceMinor !== null ? 'Leave empty to use the price in the terms.' : undefined}
          min={0}
          decimalScale={digits}
          allowDecimal={digits > 0}
          withAsterisk={sale}
          key={form.key('price')}
          {...form.getInputProps('price')}
        />
        <TextInput label="Note" key={form.key('note')} {...form.getInputProps('note')} />
        {message && (
          <Alert color="clay" role="alert">
            {message}
          </Alert>
        )}
        <Group>
          <Button type="submit" loading={create.isPending}>
            {sale ? 'Record sale' : 'Record cash-out'}
          </Button>
        </Group>
        {!sale && (
          <Text size="xs" c="dimmed">
            A cash-out makes the party running the project owe this party the count times the price.
          </Text>
        )}
      </Stack>
    </form>
  );
}

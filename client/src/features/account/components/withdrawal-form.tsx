import { NativeSelect, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { NumberField } from '@/components/fields/number-field';
import { TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { dateRule, readDate } from '@/components/fields/typed-date';
import { numberRule, readNumber } from '@/components/fields/typed-number';
import { FormActions } from '@/components/ui/form-actions';
import { SafetyNote } from '@/components/ui/safety-note';
import { TEXT_LIMITS, parseMoney, toMinor, type PartyBalanceView, type SacSharesView } from '@broodsilk/shared';
import { useCreateEntry } from '../api/entries';
import { SacCountDateFields } from './sac-count-date-fields';
import { applyEntryErrors } from '../utils/entry-errors';
import { young } from '../utils/labels';

interface Values {
  memberId: string;
  sacId: string;
  count: string;
  date: string;
  price: string;
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
    validateInputOnBlur: true,
    initialValues: { memberId: '', sacId: '', count: '', date: today, price: '', note: '' },
    validate: {
      memberId: (v) => (v ? null : 'Whose share is this from?'),
      count: numberRule({ required: 'How many spiderlings?', min: 1, max: 100_000, decimals: 0, rangeMessage: 'A count is a whole number from 1 to 100,000.' }),
      date: dateRule({ required: 'Give the date.', latest: today, latestMessage: 'This has happened, so it cannot be after today.' }),
      sacId: (v) => (withYoung.length > 1 && !v ? 'Several sacs have young in care: which one?' : null),
      price: (v) => {
        if (v.trim() === '') return sale ? 'What was the total price?' : null;
        const price = parseMoney(v, currency);
        return !price.ok ? price.message : price.minor >= 0 ? null : 'The price must be 0 or more.';
      },
      note: textRule({ maxLength: TEXT_LIMITS.ledgerNote }),
    },
  });
  const submit = form.onSubmit(async (v) => {
    setMessage(null);
    const price = v.price.trim() === '' ? undefined : toMinor(v.price, currency);
    try {
      await create.mutateAsync({
        kind,
        memberId: v.memberId,
        sacId: v.sacId || undefined,
        count: readNumber(v.count)!,
        date: readDate(v.date)!,
        ...(sale ? { priceMinor: price, currency } : { pricePerSpiderlingMinor: price }),
        note: v.note.trim() || undefined,
      });
      form.reset();
      onDone?.();
    } catch (e) {
      setMessage(applyEntryErrors(form, e));
    }
  });
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
        <SacCountDateFields
          withYoung={withYoung}
          sac={{ key: form.key('sacId'), ...form.getInputProps('sacId') }}
          count={{ key: form.key('count'), ...form.getInputProps('count') }}
          date={{ key: form.key('date'), ...form.getInputProps('date') }}
        />
        <NumberField
          label={sale ? `Total price (${currency})` : `Price per spiderling (${currency})`}
          description={!sale && termsPriceMinor !== null ? 'Leave empty to use the price in the terms.' : undefined}
          withAsterisk={sale}
          key={form.key('price')}
          {...form.getInputProps('price')}
        />
        <TextField label="Note" maxLength={TEXT_LIMITS.ledgerNote} key={form.key('note')} {...form.getInputProps('note')} />
        {sale && <SafetyNote text="sale" />}
        <FormActions message={message} loading={create.isPending} submitLabel={sale ? 'Record sale' : 'Record cash-out'} />
        {!sale && (
          <Text size="xs" c="dimmed">
            A cash-out makes the party running the project owe this party the count times the price.
          </Text>
        )}
      </Stack>
    </form>
  );
}

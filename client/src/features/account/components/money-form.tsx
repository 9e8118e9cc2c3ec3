import { Group, NativeSelect, Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { DateField } from '@/components/fields/date-field';
import { NumberField } from '@/components/fields/number-field';
import { TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { readDate } from '@/components/fields/typed-date';
import { FormActions } from '@/components/ui/form-actions';
import { TEXT_LIMITS, minorToMajor, parseMoney, toMinor, type PartyRef } from '@broodsilk/shared';
import { useCreateEntry } from '../api/entries';
import { applyEntryErrors } from '../utils/entry-errors';
import { pastDateRule } from './sac-count-date-fields';
import { useWords } from '@/lib/i18n';
import { sentence } from '@/lib/sentence';

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
export function MoneyForm({ projectId, parties, currency, today, fromMemberId, toMemberId, amountMinor, submitLabel, onDone }: Props) {
  const t = useWords();
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
      fromMemberId: (v) => (v ? null : t('page.account.money.whoPaid')),
      toMemberId: (v, all) => (!v ? t('page.account.money.whoWasPaid') : v === all.fromMemberId ? t('page.account.money.sameParty') : null),
      amount: (v) => {
        const amount = parseMoney(v, currency);
        return !amount.ok ? sentence(t, amount) : amount.minor > 0 ? null : t('page.account.form.amountAboveZero');
      },
      note: textRule({ maxLength: TEXT_LIMITS.ledgerNote }),
      date: pastDateRule(t, today),
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
  const options = [{ value: '', label: t('page.account.form.chooseParty') }, ...parties.map((p) => ({ value: p.memberId, label: p.name }))];
  return (
    <form onSubmit={submit} noValidate aria-label={t('page.account.action.money')}>
      <Stack maw={520} gap="sm">
        <Group grow align="flex-start">
          <NativeSelect
            label={t('page.account.money.paidBy')}
            data={options}
            disabled={fromMemberId !== undefined}
            key={form.key('fromMemberId')}
            {...form.getInputProps('fromMemberId')}
          />
          <NativeSelect
            label={t('page.account.money.paidTo')}
            data={options}
            disabled={toMemberId !== undefined}
            key={form.key('toMemberId')}
            {...form.getInputProps('toMemberId')}
          />
        </Group>
        <Group grow align="flex-start">
          <NumberField label={t('page.account.form.amount', { currency })} withAsterisk key={form.key('amount')} {...form.getInputProps('amount')} />
          <DateField label={t('page.account.form.date')} withAsterisk key={form.key('date')} {...form.getInputProps('date')} />
        </Group>
        <TextField
          label={t('page.account.form.note')}
          placeholder={t('page.account.money.notePlaceholder')}
          maxLength={TEXT_LIMITS.ledgerNote}
          key={form.key('note')}
          {...form.getInputProps('note')}
        />
        <FormActions message={message} loading={create.isPending} submitLabel={submitLabel ?? t('page.account.submit.money')} />
      </Stack>
    </form>
  );
}

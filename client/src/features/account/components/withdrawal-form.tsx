import { NativeSelect, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { NumberField } from '@/components/fields/number-field';
import { TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { readDate } from '@/components/fields/typed-date';
import { readNumber } from '@/components/fields/typed-number';
import { FormActions } from '@/components/ui/form-actions';
import { SafetyNote } from '@/components/ui/safety-note';
import { TEXT_LIMITS, parseMoney, toMinor, type PartyBalanceView, type SacSharesView } from '@broodsilk/shared';
import { useCreateEntry } from '../api/entries';
import { countRule, pastDateRule, SacCountDateFields } from './sac-count-date-fields';
import { useWords } from '@/lib/i18n';
import { sentence } from '@/lib/sentence';
import { applyEntryErrors } from '../utils/entry-errors';
import { partyOwed } from '../utils/labels';

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
  /** The species' protected-trade listing (e.g. "CITES Appendix II"); null when not listed or not known. */
  tradeListing?: string | null;
  today: string;
  onDone?: () => void;
}

/** A sale to an outside buyer, or a cash-out (money instead of young): both take young off a party's share. */
export function WithdrawalForm({ projectId, kind, parties, sacs, currency, termsPriceMinor, tradeListing = null, today, onDone }: Props) {
  const t = useWords();
  const create = useCreateEntry(projectId);
  const [message, setMessage] = useState<string | null>(null);
  const withYoung = sacs.filter((s) => s.aliveInCare > 0);
  const sale = kind === 'sale';
  const form = useForm<Values>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { memberId: '', sacId: '', count: '', date: today, price: '', note: '' },
    validate: {
      memberId: (v) => (v ? null : t('page.account.withdrawal.whoseShare')),
      count: countRule(t),
      date: pastDateRule(t, today),
      sacId: (v) => (withYoung.length > 1 && !v ? t('page.account.form.whichSac') : null),
      price: (v) => {
        if (v.trim() === '') return sale ? t('page.account.withdrawal.totalPriceRequired') : null;
        const price = parseMoney(v, currency);
        return !price.ok ? sentence(t, price) : price.minor >= 0 ? null : t('page.account.withdrawal.priceNotNegative');
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
    <form onSubmit={submit} noValidate aria-label={t(`page.account.action.${kind}`)}>
      <Stack maw={520} gap="sm">
        <NativeSelect
          label={t(sale ? 'page.account.withdrawal.saleFrom' : 'page.account.withdrawal.cashedOutBy')}
          data={[{ value: '', label: t('page.account.form.chooseParty') }, ...parties.map((p) => ({ value: p.memberId, label: partyOwed(p) }))]}
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
          label={t(sale ? 'page.account.withdrawal.totalPrice' : 'page.account.withdrawal.pricePerSpiderling', { currency })}
          description={!sale && termsPriceMinor !== null ? t('page.account.withdrawal.termsPriceHint') : undefined}
          withAsterisk={sale}
          key={form.key('price')}
          {...form.getInputProps('price')}
        />
        <TextField label={t('page.account.form.note')} maxLength={TEXT_LIMITS.ledgerNote} key={form.key('note')} {...form.getInputProps('note')} />
        {sale && tradeListing && <SafetyNote text="saleListed" values={{ listing: tradeListing }} />}
        {sale && <SafetyNote text="sale" />}
        <FormActions message={message} loading={create.isPending} submitLabel={t(`page.account.submit.${kind}`)} />
        {!sale && (
          <Text size="xs" c="dimmed">
            {t('page.account.withdrawal.cashOutHint')}
          </Text>
        )}
      </Stack>
    </form>
  );
}

import { Stack, Text } from '@mantine/core';
import { NumberField } from '@/components/fields/number-field';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateCheckout } from '../api/settlements';
import { formatMoney, minorToMajor, parseMoney, toMinor } from '@broodsilk/shared';
import { FormActions } from '@/components/ui/form-actions';
import { useWords } from '@/lib/i18n';
import { sentence } from '@/lib/sentence';

interface Props {
  projectId: string;
  toMemberId: string;
  toName: string;
  owedMinor: number;
  currency: string;
  /** Where the browser goes for the payment page; the real one leaves the app. */
  goTo?: (url: string) => void;
}

/** "Pay what you owe": an amount up to the debt, paid on the payment provider's page. */
export function PayForm({ projectId, toMemberId, toName, owedMinor, currency, goTo = (url) => window.location.assign(url) }: Props) {
  const t = useWords();
  const checkout = useCreateCheckout(projectId);
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<{ amount: string }>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { amount: String(minorToMajor(owedMinor, currency)) },
    validate: {
      amount: (v) => {
        const amount = parseMoney(v, currency);
        if (!amount.ok) return sentence(t, amount);
        if (amount.minor <= 0) return t('page.account.form.amountAboveZero');
        return amount.minor > owedMinor ? t('page.account.pay.tooMuch', { name: toName, amount: formatMoney(owedMinor, currency) }) : null;
      },
    },
  });
  const submit = form.onSubmit(async (v) => {
    setMessage(null);
    try {
      const session = await checkout.mutateAsync({ toMemberId, amountMinor: toMinor(v.amount, currency) });
      goTo(session.url);
    } catch (e) {
      setMessage(applyServerErrors(form, e));
    }
  });
  return (
    <form onSubmit={submit} noValidate aria-label={t('page.account.pay.formLabel', { name: toName })}>
      <Stack gap="xs" maw={420}>
        <Text size="sm">{t('page.account.pay.youOwe', { name: toName, amount: formatMoney(owedMinor, currency) })}</Text>
        <NumberField label={t('page.account.form.amount', { currency })} key={form.key('amount')} {...form.getInputProps('amount')} />
        <FormActions message={message} loading={checkout.isPending} submitLabel={t('page.account.pay.submit')} />
        <Text size="xs" c="dimmed">
          {t('page.account.pay.providerPage')}
        </Text>
      </Stack>
    </form>
  );
}

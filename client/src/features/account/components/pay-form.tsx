import { Stack, Text } from '@mantine/core';
import { NumberField } from '@/components/fields/number-field';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateCheckout } from '../api/settlements';
import { formatMoney, minorToMajor, parseMoney, toMinor } from '@broodsilk/shared';
import { FormActions } from '@/components/ui/form-actions';

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
  const checkout = useCreateCheckout(projectId);
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<{ amount: string }>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { amount: String(minorToMajor(owedMinor, currency)) },
    validate: {
      amount: (v) => {
        const amount = parseMoney(v, currency);
        if (!amount.ok) return amount.message;
        if (amount.minor <= 0) return 'The amount must be above 0.';
        return amount.minor > owedMinor ? `You owe ${toName} ${formatMoney(owedMinor, currency)}; the amount cannot be more than that.` : null;
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
    <form onSubmit={submit} noValidate aria-label={`Pay ${toName}`}>
      <Stack gap="xs" maw={420}>
        <Text size="sm">
          You owe {toName} {formatMoney(owedMinor, currency)}.
        </Text>
        <NumberField label={`Amount (${currency})`} key={form.key('amount')} {...form.getInputProps('amount')} />
        <FormActions message={message} loading={checkout.isPending} submitLabel="Pay what you owe" />
        <Text size="xs" c="dimmed">
          You will pay on the payment provider’s page and come back here afterwards.
        </Text>
      </Stack>
    </form>
  );
}

import { Button, Group, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { formatMoney, type ConfirmEntryRequest, type LedgerEntryResponse, type Words } from '@broodsilk/shared';
import { DateField } from '@/components/fields/date-field';
import { NumberField } from '@/components/fields/number-field';
import { checkDate, readDate } from '@/components/fields/typed-date';
import { checkNumber, numberRule, readNumber } from '@/components/fields/typed-number';
import { ConfirmAction } from '@/components/ui/confirm-action';
import { FormActions } from '@/components/ui/form-actions';
import { applyServerErrors } from '@/lib/form-errors';
import { useWords, words } from '@/lib/i18n';
import { useConfirmEntry } from '../api/entries';
import { ENTRY_KIND_LABELS } from '../utils/labels';

interface Values {
  arrivedAlive: string;
  arrivedDead: string;
  date: string;
}

const count = () => ({ min: 0, max: 100_000, decimals: 0, rangeMessage: words('page.account.confirm.wholeOrZero') });

/** The arrival day, not after today (the sender's day may be in another zone, so the server judges the order). */
const arrivalRule = (today: string) => (v: string) =>
  checkDate(v, { required: words('page.account.confirm.whichDay'), latest: today, latestMessage: words('page.shell.fields.notAfterToday') });

/** The recipient confirms a hand-over with the arrival counts (losses after it are theirs), after one question. */
function ConfirmHandOver({ projectId, entry, today }: { projectId: string; entry: LedgerEntryResponse; today: string }) {
  const t = useWords();
  const confirm = useConfirmEntry(projectId);
  const [message, setMessage] = useState<string | null>(null);
  const [asking, setAsking] = useState<ConfirmEntryRequest | null>(null);
  const handedOver = entry.count ?? 0;
  const form = useForm<Values>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { arrivedAlive: String(handedOver), arrivedDead: '0', date: today },
    validate: {
      arrivedAlive: (v, all) =>
        checkNumber(v, { ...count(), required: t('page.account.confirm.howManyAlive') }) ??
        ((readNumber(v) ?? 0) + (readNumber(all.arrivedDead) ?? 0) > handedOver ? t('page.account.confirm.tooMany', { total: handedOver }) : null),
      arrivedDead: numberRule(count()),
      date: arrivalRule(today),
    },
  });
  const submit = form.onSubmit((v) => {
    setMessage(null);
    setAsking({ arrivedAlive: readNumber(v.arrivedAlive)!, arrivedDead: readNumber(v.arrivedDead) ?? 0, date: readDate(v.date)! });
  });
  async function send(body: ConfirmEntryRequest) {
    try {
      await confirm.mutateAsync({ entryId: entry.id, body });
      setAsking(null);
    } catch (e) {
      setAsking(null);
      setMessage(applyServerErrors(form, e));
    }
  }
  return (
    <form onSubmit={submit} noValidate aria-label={t('page.account.confirm.handOverLabel', { seq: entry.seq })}>
      <Stack gap="xs" maw={420}>
        <Group grow align="flex-start">
          <NumberField label={t('page.account.confirm.arrivedAlive')} whole key={form.key('arrivedAlive')} {...form.getInputProps('arrivedAlive')} />
          <NumberField label={t('page.account.confirm.arrivedDead')} whole key={form.key('arrivedDead')} {...form.getInputProps('arrivedDead')} />
        </Group>
        <DateField label={t('page.account.confirm.arrivedOn')} key={form.key('date')} {...form.getInputProps('date')} />
        <FormActions message={message} loading={confirm.isPending} submitLabel={t('page.account.confirm.submit')} />
      </Stack>
      {asking && (
        <ConfirmAction
          opened
          onClose={() => setAsking(null)}
          title={t('page.account.confirm.title')}
          confirmLabel={t('page.account.confirm.yes')}
          pending={confirm.isPending}
          onConfirm={() => send(asking)}
        >
          <Text size="sm">
            {t(asking.arrivedDead ? 'page.account.confirm.receiptDead' : 'page.account.confirm.receipt', {
              alive: asking.arrivedAlive,
              dead: asking.arrivedDead,
              count: handedOver,
              date: asking.date,
            })}
          </Text>
        </ConfirmAction>
      )}
    </form>
  );
}

/** A payment to the viewer, or a cash-out or sale of their young below the price in the terms: accepted once, with the day it arrived. */
function ConfirmPayment({ projectId, entry, today }: { projectId: string; entry: LedgerEntryResponse; today: string }) {
  const t = useWords();
  const confirm = useConfirmEntry(projectId);
  const [asking, setAsking] = useState(false);
  const [date, setDate] = useState(today);
  const dateError = arrivalRule(today)(date);
  return (
    <Stack gap="xs">
      <Group>
        <Button onClick={() => setAsking(true)} disabled={confirm.isPending}>
          {t(
            entry.kind === 'money'
              ? 'page.account.confirm.paymentArrived'
              : entry.kind === 'sale'
                ? 'page.account.confirm.acceptSale'
                : 'page.account.confirm.acceptCashOut',
          )}
        </Button>
      </Group>
      {asking && (
        <ConfirmAction
          opened
          onClose={() => setAsking(false)}
          title={t('page.account.confirm.paymentTitle')}
          confirmLabel={t('page.account.confirm.paymentYes')}
          pending={confirm.isPending}
          ready={!dateError}
          message={confirm.isError ? confirm.error.message : null}
          onConfirm={() => confirm.mutate({ entryId: entry.id, body: { date: readDate(date)! } }, { onSuccess: () => setAsking(false) })}
        >
          <Text size="sm">
            {entry.amountMinor !== null && entry.currency
              ? t('page.account.confirm.paymentAmount', { amount: formatMoney(entry.amountMinor, entry.currency) })
              : t('page.account.confirm.paymentNoAmount')}
          </Text>
          <DateField label={t('page.account.confirm.arrivedOn')} value={date} onChange={(e) => setDate(e.currentTarget.value)} error={dateError} />
        </ConfirmAction>
      )}
    </Stack>
  );
}

/** What reaches the viewer, said in one sentence: a hand-over, a cash-out or sale below the terms' price, or a payment. */
function awaitingText(t: Words, e: LedgerEntryResponse): string {
  const common = { seq: e.seq, count: e.count ?? 0, date: e.date };
  if (e.kind === 'hand-over') return t(e.method === 'shipment' ? 'page.account.confirm.shippedToYou' : 'page.account.confirm.handedToYou', common);
  if (e.kind === 'cash-out' || e.kind === 'sale') {
    const kind = ENTRY_KIND_LABELS[e.kind];
    if (e.kind === 'sale' && e.priceMinor !== null && e.currency)
      return t('page.account.confirm.belowTotal', { ...common, kind, price: formatMoney(e.priceMinor, e.currency) });
    return t(e.pricePerSpiderlingMinor ? 'page.account.confirm.belowLower' : 'page.account.confirm.belowNothing', { ...common, kind });
  }
  const amount = e.amountMinor !== null && e.currency ? formatMoney(e.amountMinor, e.currency) : '';
  return t('page.account.confirm.paid', { seq: e.seq, from: e.from?.name ?? '?', to: e.to?.name ?? '?', amount, date: e.date });
}

/** Entries waiting for the viewer's acceptance: hand-overs and payments to them, cash-outs and sales of their young below the terms' price. */
export function AwaitingMe({ projectId, entries, today }: { projectId: string; entries: LedgerEntryResponse[]; today: string }) {
  const t = useWords();
  return (
    <Stack gap="sm" data-testid="awaiting-me">
      {entries.map((e) => (
        <Stack key={e.id} gap={4}>
          <Text size="sm" fw={600} className="tone-due">
            {awaitingText(t, e)}
          </Text>
          {e.kind === 'hand-over' ? (
            <ConfirmHandOver projectId={projectId} entry={e} today={today} />
          ) : (
            <ConfirmPayment projectId={projectId} entry={e} today={today} />
          )}
        </Stack>
      ))}
    </Stack>
  );
}

import { Button, Group, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { formatMoney, type ConfirmEntryRequest, type LedgerEntryResponse } from '@broodsilk/shared';
import { DateField } from '@/components/fields/date-field';
import { NumberField } from '@/components/fields/number-field';
import { checkDate, dateInWords, readDate } from '@/components/fields/typed-date';
import { checkNumber, numberRule, readNumber } from '@/components/fields/typed-number';
import { ConfirmAction } from '@/components/ui/confirm-action';
import { FormActions } from '@/components/ui/form-actions';
import { formatDate } from '@/lib/dates';
import { applyServerErrors } from '@/lib/form-errors';
import { useConfirmEntry } from '../api/entries';

interface Values {
  arrivedAlive: string;
  arrivedDead: string;
  date: string;
}

const COUNT = { min: 0, max: 100_000, decimals: 0, rangeMessage: 'A whole number, 0 or more.' };

/** The arrival day, not after today (the sender's day may be in another zone, so the server judges the order). */
const arrivalRule = (today: string) => (v: string) =>
  checkDate(v, { required: 'On which day did it arrive?', latest: today, latestMessage: 'This has happened, so it cannot be after today.' });

/** The recipient confirms a hand-over with the arrival counts (losses after it are theirs), after one question. */
function ConfirmHandOver({ projectId, entry, today }: { projectId: string; entry: LedgerEntryResponse; today: string }) {
  const confirm = useConfirmEntry(projectId);
  const [message, setMessage] = useState<string | null>(null);
  const [asking, setAsking] = useState<ConfirmEntryRequest | null>(null);
  const count = entry.count ?? 0;
  const form = useForm<Values>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { arrivedAlive: String(count), arrivedDead: '0', date: today },
    validate: {
      arrivedAlive: (v, all) =>
        checkNumber(v, { ...COUNT, required: 'How many arrived alive?' }) ??
        ((readNumber(v) ?? 0) + (readNumber(all.arrivedDead) ?? 0) > count ? `Alive and dead together cannot be more than the ${count} handed over.` : null),
      arrivedDead: numberRule(COUNT),
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
    <form onSubmit={submit} noValidate aria-label={`Confirm receipt of hand-over #${entry.seq}`}>
      <Stack gap="xs" maw={420}>
        <Group grow align="flex-start">
          <NumberField label="Arrived alive" whole key={form.key('arrivedAlive')} {...form.getInputProps('arrivedAlive')} />
          <NumberField label="Arrived dead" whole key={form.key('arrivedDead')} {...form.getInputProps('arrivedDead')} />
        </Group>
        <DateField label="Arrived on" key={form.key('date')} {...form.getInputProps('date')} />
        <FormActions message={message} loading={confirm.isPending} submitLabel="Confirm receipt" />
      </Stack>
      {asking && (
        <ConfirmAction
          opened
          onClose={() => setAsking(null)}
          title="Confirm receipt"
          confirmLabel="Yes, confirm receipt"
          pending={confirm.isPending}
          onConfirm={() => send(asking)}
        >
          <Text size="sm">
            You confirm that {asking.arrivedAlive} of the {count} spiderlings arrived alive{asking.arrivedDead ? ` and ${asking.arrivedDead} dead` : ''} on{' '}
            {dateInWords(asking.date!)}. From then on, losses are yours. A mistake afterwards needs a correction by the project owner.
          </Text>
        </ConfirmAction>
      )}
    </form>
  );
}

/** A payment to the viewer, or a cash-out or sale of their young below the price in the terms: accepted once, with the day it arrived. */
function ConfirmPayment({ projectId, entry, today }: { projectId: string; entry: LedgerEntryResponse; today: string }) {
  const confirm = useConfirmEntry(projectId);
  const [asking, setAsking] = useState(false);
  const [date, setDate] = useState(today);
  const dateError = arrivalRule(today)(date);
  return (
    <Stack gap="xs">
      <Group>
        <Button onClick={() => setAsking(true)} disabled={confirm.isPending}>
          {entry.kind === 'money' ? 'Confirm the payment arrived' : `Accept this ${entry.kind}`}
        </Button>
      </Group>
      {asking && (
        <ConfirmAction
          opened
          onClose={() => setAsking(false)}
          title="Confirm the payment"
          confirmLabel="Yes, it arrived"
          pending={confirm.isPending}
          ready={!dateError}
          message={confirm.isError ? confirm.error.message : null}
          onConfirm={() => confirm.mutate({ entryId: entry.id, body: { date: readDate(date)! } }, { onSuccess: () => setAsking(false) })}
        >
          <Text size="sm">
            You confirm that {entry.amountMinor !== null && entry.currency ? formatMoney(entry.amountMinor, entry.currency) : 'the payment'} arrived. It then
            counts in the balances.
          </Text>
          <DateField label="Arrived on" value={date} onChange={(e) => setDate(e.currentTarget.value)} error={dateError} />
        </ConfirmAction>
      )}
    </Stack>
  );
}

const belowTermsPrice = (e: LedgerEntryResponse): string => {
  if (e.kind === 'sale' && e.priceMinor !== null && e.currency) return `for ${formatMoney(e.priceMinor, e.currency)} in all`;
  return e.pricePerSpiderlingMinor ? 'at a lower price per spiderling' : 'for nothing';
};

/** Entries waiting for the viewer's acceptance: hand-overs and payments to them, cash-outs and sales of their young below the terms' price. */
export function AwaitingMe({ projectId, entries, today }: { projectId: string; entries: LedgerEntryResponse[]; today: string }) {
  return (
    <Stack gap="sm" data-testid="awaiting-me">
      {entries.map((e) => (
        <Stack key={e.id} gap={4}>
          <Text size="sm" fw={600} className="tone-due">
            {e.kind === 'hand-over'
              ? `#${e.seq}: ${e.count} spiderlings handed over to you on ${formatDate(e.date)}${e.method === 'shipment' ? ' by shipment' : ''}`
              : e.kind === 'cash-out' || e.kind === 'sale'
                ? `#${e.seq}: ${e.kind} of ${e.count} of your spiderlings on ${formatDate(e.date)} ${belowTermsPrice(e)}, below the price in the terms`
                : `#${e.seq}: ${e.from?.name ?? '?'} paid ${e.to?.name ?? '?'} ${e.amountMinor !== null && e.currency ? formatMoney(e.amountMinor, e.currency) : ''} on ${formatDate(e.date)}`}
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

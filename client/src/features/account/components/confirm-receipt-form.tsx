import { Alert, Button, Group, NumberInput, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { formatMoney, type LedgerEntryResponse } from '@broodsilk/shared';
import { formatDate } from '@/lib/dates';
import { applyServerErrors } from '@/lib/form-errors';
import { useConfirmEntry } from '../api/entries';
import { FormActions } from '@/components/ui/form-actions';

interface Values {
  arrivedAlive: number | string;
  arrivedDead: number | string;
}

/** The recipient confirms a hand-over with the arrival counts (losses after it are theirs). */
function ConfirmHandOver({ projectId, entry }: { projectId: string; entry: LedgerEntryResponse }) {
  const confirm = useConfirmEntry(projectId);
  const [message, setMessage] = useState<string | null>(null);
  const count = entry.count ?? 0;
  const form = useForm<Values>({
    mode: 'uncontrolled',
    initialValues: { arrivedAlive: count, arrivedDead: 0 },
    validate: {
      arrivedAlive: (v, all) => {
        if (!Number.isInteger(Number(v)) || Number(v) < 0) return 'A whole number, 0 or more.';
        return Number(v) + Number(all.arrivedDead || 0) > count ? `Alive and dead together cannot be more than the ${count} handed over.` : null;
      },
      arrivedDead: (v) => (Number.isInteger(Number(v)) && Number(v) >= 0 ? null : 'A whole number, 0 or more.'),
    },
  });
  const submit = form.onSubmit(async (v) => {
    setMessage(null);
    try {
      await confirm.mutateAsync({ entryId: entry.id, body: { arrivedAlive: Number(v.arrivedAlive), arrivedDead: Number(v.arrivedDead || 0) } });
    } catch (e) {
      setMessage(applyServerErrors(form, e));
    }
  });
  return (
    <form onSubmit={submit} noValidate aria-label={`Confirm receipt of hand-over #${entry.seq}`}>
      <Stack gap="xs" maw={420}>
        <Group grow align="flex-start">
          <NumberInput label="Arrived alive" min={0} allowDecimal={false} key={form.key('arrivedAlive')} {...form.getInputProps('arrivedAlive')} />
          <NumberInput label="Arrived dead" min={0} allowDecimal={false} key={form.key('arrivedDead')} {...form.getInputProps('arrivedDead')} />
        </Group>
        <FormActions message={message} loading={confirm.isPending} submitLabel="Confirm receipt" />
      </Stack>
    </form>
  );
}

/** A payment to the viewer, or a cash-out or sale of their young below the price in the terms: one press accepts it. */
function ConfirmPayment({ projectId, entry }: { projectId: string; entry: LedgerEntryResponse }) {
  const confirm = useConfirmEntry(projectId);
  return (
    <Stack gap="xs">
      {confirm.isError && (
        <Alert color="clay" role="alert">
          {confirm.error.message}
        </Alert>
      )}
      <Group>
        <Button loading={confirm.isPending} onClick={() => confirm.mutate({ entryId: entry.id, body: {} })}>
          {entry.kind === 'money' ? 'Confirm the payment arrived' : `Accept this ${entry.kind}`}
        </Button>
      </Group>
    </Stack>
  );
}

const belowTermsPrice = (e: LedgerEntryResponse): string => {
  if (e.kind === 'sale' && e.priceMinor !== null && e.currency) return `for ${formatMoney(e.priceMinor, e.currency)} in all`;
  return e.pricePerSpiderlingMinor ? 'at a lower price per spiderling' : 'for nothing';
};

/** Entries waiting for the viewer's acceptance: hand-overs and payments to them, cash-outs and sales of their young below the terms' price. */
export function AwaitingMe({ projectId, entries }: { projectId: string; entries: LedgerEntryResponse[] }) {
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
          {e.kind === 'hand-over' ? <ConfirmHandOver projectId={projectId} entry={e} /> : <ConfirmPayment projectId={projectId} entry={e} />}
        </Stack>
      ))}
    </Stack>
  );
}

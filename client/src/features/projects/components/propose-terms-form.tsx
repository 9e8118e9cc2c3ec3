import { Button, Collapse, Group, Stack, Text } from '@mantine/core';
import { NumberField } from '@/components/fields/number-field';
import { TextField } from '@/components/fields/text-field';
import { checkText } from '@/components/fields/text-rule';
import { checkNumber } from '@/components/fields/typed-number';
import { useForm } from '@mantine/form';
import { useDisclosure } from '@mantine/hooks';
import { useState } from 'react';
import {
  DEFAULT_HAND_OVER_STAGE,
  minorToMajor,
  TEXT_LIMITS,
  toMinor,
  type BroodStage,
  type FailureClause,
  type ProjectMemberResponse,
  type ShippingPayer,
  type TermsVersionResponse,
} from '@broodsilk/shared';
import { applyServerErrors } from '@/lib/form-errors';
import { useProposeTerms } from '../api/terms';
import { priceError } from '../utils/price';
import { FormActions } from '@/components/ui/form-actions';
import { PartyTable } from '@/components/ui/party-table';
import { DealFields } from './deal-fields';

/** The server's limits on a party's line of the terms. */
export const LINE_RULES = {
  weight: { min: 0, max: 1_000_000, decimals: 0, rangeMessage: 'A weight is a whole number from 0 to 1,000,000.' },
  fixedCount: { min: 0, max: 100_000, decimals: 0, rangeMessage: 'A fixed count is a whole number from 0 to 100,000.' },
  pickOrder: { min: 1, max: 1000, decimals: 0, rangeMessage: 'Pick orders are whole numbers from 1 (picks first) to 1000.' },
} as const;

/** The numbers a party's line holds, as the form asks for them. */
const LINE_FIELDS = [
  { field: 'weight', header: 'Weight', name: (party: string) => `Weight of ${party}` },
  { field: 'fixedCount', header: 'Fixed count', name: (party: string) => `Fixed count of ${party}` },
  { field: 'pickOrder', header: 'Pick order', name: (party: string) => `Pick order of ${party}` },
] as const;

interface Values {
  lines: { memberId: string; name: string; weight: number | string; fixedCount: number | string; pickOrder: number | string }[];
  price: number | string;
  currency: string;
  failureClause: FailureClause;
  handOverStage: BroodStage;
  shippingPaidBy: ShippingPayer;
  note: string;
}

/** The owner proposes a new version of the terms; it starts from the latest one. */
export function ProposeTermsForm({ projectId, members, base }: { projectId: string; members: ProjectMemberResponse[]; base?: TermsVersionResponse }) {
  const [opened, { toggle, close }] = useDisclosure(false);
  const [message, setMessage] = useState<string | null>(null);
  const propose = useProposeTerms(projectId);
  const parties = members.filter((m) => m.role === 'owner' || m.role === 'partner');
  const form = useForm<Values>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: {
      lines: parties.map((m, i) => {
        const prev = base?.lines.find((l) => l.memberId === m.id);
        return { memberId: m.id, name: m.name, weight: prev?.weight ?? 1, fixedCount: prev?.fixedCount ?? 0, pickOrder: prev?.pickOrder ?? i + 1 };
      }),
      price: base ? minorToMajor(base.pricePerSpiderlingMinor, base.currency) : 0,
      currency: base?.currency ?? 'EUR',
      failureClause: base?.failureClause ?? 'nothing-owed',
      handOverStage: base?.handOverStage ?? DEFAULT_HAND_OVER_STAGE,
      shippingPaidBy: base?.shippingPaidBy ?? 'recipient',
      note: '',
    },
    validate: {
      lines: {
        weight: (v) => checkNumber(String(v), { required: 'Give a weight.', ...LINE_RULES.weight }),
        fixedCount: (v) => checkNumber(String(v), LINE_RULES.fixedCount),
        pickOrder: (v) => checkNumber(String(v), { required: 'Give a pick order.', ...LINE_RULES.pickOrder }),
      },
      price: (v, values) => priceError(v, values.currency),
      note: (v) => checkText(v, { maxLength: TEXT_LIMITS.note }),
      currency: (v) => (/^[A-Z]{3}$/.test(v) ? null : 'Use a three-letter currency code, e.g. EUR.'),
    },
  });

  const submit = form.onSubmit(async (v) => {
    setMessage(null);
    try {
      await propose.mutateAsync({
        lines: v.lines.map((l) => ({ memberId: l.memberId, weight: Number(l.weight), fixedCount: Number(l.fixedCount) || 0, pickOrder: Number(l.pickOrder) })),
        pricePerSpiderlingMinor: toMinor(v.price, v.currency),
        currency: v.currency,
        failureClause: v.failureClause,
        handOverStage: v.handOverStage,
        shippingPaidBy: v.shippingPaidBy,
        note: v.note.trim() || null,
      });
      close();
    } catch (e) {
      setMessage(applyServerErrors(form, e));
    }
  });

  return (
    <Stack gap="xs">
      <Group>
        <Button variant="light" onClick={toggle}>
          {opened ? 'Close' : base ? 'Propose changed terms' : 'Propose terms'}
        </Button>
      </Group>
      <Collapse expanded={opened}>
        <form onSubmit={submit} noValidate>
          <Stack>
            <Text size="sm" c="dimmed">
              Shares are each party&apos;s weight over the sum of weights. A fixed count is taken off the top before the split. Partners must accept a new
              version before it is in force.
            </Text>
            <PartyTable
              label="Shares of the parties"
              minWidth={420}
              small
              rows={form.getValues().lines.map((l, i) => ({ ...l, i }))}
              rowKey={(l) => l.memberId}
              columns={[
                { header: 'Party', cell: (l) => l.name },
                ...LINE_FIELDS.map(({ field, header, name }) => ({
                  header,
                  cell: (l: Values['lines'][number] & { i: number }) => (
                    <NumberField aria-label={name(l.name)} whole key={form.key(`lines.${l.i}.${field}`)} {...form.getInputProps(`lines.${l.i}.${field}`)} />
                  ),
                })),
              ]}
            />
            <DealFields field={(name) => ({ key: form.key(name), ...form.getInputProps(name) })}>
              <TextField label="Note to partners" maxLength={TEXT_LIMITS.note} key={form.key('note')} {...form.getInputProps('note')} />
            </DealFields>
            <FormActions message={message} loading={propose.isPending} submitLabel="Propose this version" />
          </Stack>
        </form>
      </Collapse>
    </Stack>
  );
}

import { Button, Collapse, Group, Select, SimpleGrid, Stack, Table, Text } from '@mantine/core';
import { NumberField } from '@/components/fields/number-field';
import { TextField } from '@/components/fields/text-field';
import { checkText } from '@/components/fields/text-rule';
import { checkNumber } from '@/components/fields/typed-number';
import { useForm } from '@mantine/form';
import { useDisclosure } from '@mantine/hooks';
import { useState } from 'react';
import {
  BROOD_STAGES,
  broodStageLabel,
  DEFAULT_HAND_OVER_STAGE,
  FAILURE_CLAUSES,
  minorToMajor,
  SHIPPING_PAYERS,
  TEXT_LIMITS,
  toMinor,
  type BroodStage,
  type FailureClause,
  type ProjectMemberResponse,
  type ShippingPayer,
  type TermsVersionResponse,
} from '@broodsilk/shared';
import { currentNumbering, words } from '@/lib/i18n';
import { applyServerErrors } from '@/lib/form-errors';
import { useProposeTerms } from '../api/terms';
import { FAILURE_CLAUSE_LABELS, SHIPPING_LABELS } from '../utils/labels';
import { priceError } from '../utils/price';
import { FormActions } from '@/components/ui/form-actions';

export const CURRENCIES = ['EUR', 'USD', 'GBP', 'PLN', 'CHF', 'CZK', 'SEK', 'CAD', 'AUD'];
export const failureOptions = () => FAILURE_CLAUSES.map((c) => ({ value: c, label: FAILURE_CLAUSE_LABELS[c] }));
export const shippingOptions = () => SHIPPING_PAYERS.map((s) => ({ value: s, label: SHIPPING_LABELS[s] }));
/** The server's limits on a party's line of the terms. */
export const LINE_RULES = {
  weight: { min: 0, max: 1_000_000, decimals: 0, rangeMessage: 'A weight is a whole number from 0 to 1,000,000.' },
  fixedCount: { min: 0, max: 100_000, decimals: 0, rangeMessage: 'A fixed count is a whole number from 0 to 100,000.' },
  pickOrder: { min: 1, max: 1000, decimals: 0, rangeMessage: 'Pick orders are whole numbers from 1 (picks first) to 1000.' },
} as const;

export const handOverOptions = () => BROOD_STAGES.map((s) => ({ value: s, label: broodStageLabel(words, s, currentNumbering()) }));

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
            <Table.ScrollContainer minWidth={420}>
              <Table verticalSpacing={4}>
                <Table.Thead>
                  <Table.Tr>
                    <Table.Th>Party</Table.Th>
                    <Table.Th>Weight</Table.Th>
                    <Table.Th>Fixed count</Table.Th>
                    <Table.Th>Pick order</Table.Th>
                  </Table.Tr>
                </Table.Thead>
                <Table.Tbody>
                  {form.getValues().lines.map((l, i) => (
                    <Table.Tr key={l.memberId}>
                      <Table.Td>{l.name}</Table.Td>
                      <Table.Td>
                        <NumberField
                          aria-label={`Weight of ${l.name}`}
                          whole
                          key={form.key(`lines.${i}.weight`)}
                          {...form.getInputProps(`lines.${i}.weight`)}
                        />
                      </Table.Td>
                      <Table.Td>
                        <NumberField
                          aria-label={`Fixed count of ${l.name}`}
                          whole
                          key={form.key(`lines.${i}.fixedCount`)}
                          {...form.getInputProps(`lines.${i}.fixedCount`)}
                        />
                      </Table.Td>
                      <Table.Td>
                        <NumberField
                          aria-label={`Pick order of ${l.name}`}
                          whole
                          key={form.key(`lines.${i}.pickOrder`)}
                          {...form.getInputProps(`lines.${i}.pickOrder`)}
                        />
                      </Table.Td>
                    </Table.Tr>
                  ))}
                </Table.Tbody>
              </Table>
            </Table.ScrollContainer>
            <SimpleGrid cols={{ base: 1, sm: 3 }}>
              <NumberField label="Price per spiderling" key={form.key('price')} {...form.getInputProps('price')} />
              <Select label="Currency" data={CURRENCIES} searchable key={form.key('currency')} {...form.getInputProps('currency')} />
              <Select
                label="If the project fails"
                data={failureOptions()}
                allowDeselect={false}
                key={form.key('failureClause')}
                {...form.getInputProps('failureClause')}
              />
              <Select
                label="Handed over at"
                data={handOverOptions()}
                allowDeselect={false}
                key={form.key('handOverStage')}
                {...form.getInputProps('handOverStage')}
              />
              <Select
                label="Shipping"
                data={shippingOptions()}
                allowDeselect={false}
                key={form.key('shippingPaidBy')}
                {...form.getInputProps('shippingPaidBy')}
              />
              <TextField label="Note to partners" maxLength={TEXT_LIMITS.note} key={form.key('note')} {...form.getInputProps('note')} />
            </SimpleGrid>
            <FormActions message={message} loading={propose.isPending} submitLabel="Propose this version" />
          </Stack>
        </form>
      </Collapse>
    </Stack>
  );
}

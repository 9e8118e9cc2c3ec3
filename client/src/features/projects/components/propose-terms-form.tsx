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
  type Words,
} from '@broodsilk/shared';
import { useWords } from '@/lib/i18n';
import { applyServerErrors } from '@/lib/form-errors';
import { useProposeTerms } from '../api/terms';
import { priceError } from '../utils/price';
import { FormActions } from '@/components/ui/form-actions';
import { PartyTable } from '@/components/ui/party-table';
import { DealFields } from './deal-fields';

/** The server's limits on a party's line of the terms, with the refusal in the reader's words. */
export const lineRules = (t: Words) =>
  ({
    weight: { min: 0, max: 1_000_000, decimals: 0, rangeMessage: t('page.projects.proposeTerms.weightRange') },
    fixedCount: { min: 0, max: 100_000, decimals: 0, rangeMessage: t('page.projects.proposeTerms.fixedCountRange') },
    pickOrder: { min: 1, max: 1000, decimals: 0, rangeMessage: t('page.projects.proposeTerms.pickOrderRange') },
  }) as const;

/** The numbers a party's line holds, as the form asks for them (catalogue keys page.projects.proposeTerms.<field> and <field>Of). */
const LINE_FIELDS = ['weight', 'fixedCount', 'pickOrder'] as const;

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
  const t = useWords();
  const rules = lineRules(t);
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
        weight: (v) => checkNumber(String(v), { required: t('page.projects.proposeTerms.weightRequired'), ...rules.weight }),
        fixedCount: (v) => checkNumber(String(v), rules.fixedCount),
        pickOrder: (v) => checkNumber(String(v), { required: t('page.projects.proposeTerms.pickOrderRequired'), ...rules.pickOrder }),
      },
      price: (v, values) => priceError(v, values.currency),
      note: (v) => checkText(v, { maxLength: TEXT_LIMITS.note }),
      currency: (v) => (/^[A-Z]{3}$/.test(v) ? null : t('page.projects.proposeTerms.currency')),
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
          {t(opened ? 'page.projects.proposeTerms.close' : base ? 'page.projects.proposeTerms.proposeChanged' : 'page.projects.proposeTerms.propose')}
        </Button>
      </Group>
      <Collapse expanded={opened}>
        <form onSubmit={submit} noValidate>
          <Stack>
            <Text size="sm" c="dimmed">
              {t('page.projects.proposeTerms.explain')}
            </Text>
            <PartyTable
              label={t('page.projects.proposeTerms.tableLabel')}
              minWidth={420}
              small
              rows={form.getValues().lines.map((l, i) => ({ ...l, i }))}
              rowKey={(l) => l.memberId}
              columns={[
                { header: t('page.projects.party'), cell: (l) => l.name },
                ...LINE_FIELDS.map((field) => ({
                  header: t(`page.projects.proposeTerms.${field}`),
                  cell: (l: Values['lines'][number] & { i: number }) => (
                    <NumberField
                      aria-label={t(`page.projects.proposeTerms.${field}Of`, { party: l.name })}
                      whole
                      key={form.key(`lines.${l.i}.${field}`)}
                      {...form.getInputProps(`lines.${l.i}.${field}`)}
                    />
                  ),
                })),
              ]}
            />
            <DealFields field={(name) => ({ key: form.key(name), ...form.getInputProps(name) })}>
              <TextField label={t('page.projects.proposeTerms.note')} maxLength={TEXT_LIMITS.note} key={form.key('note')} {...form.getInputProps('note')} />
            </DealFields>
            <FormActions message={message} loading={propose.isPending} submitLabel={t('page.projects.proposeTerms.submit')} />
          </Stack>
        </form>
      </Collapse>
    </Stack>
  );
}

import { Alert, Group, List, NativeSelect, SegmentedControl, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { readDate } from '@/components/fields/typed-date';
import { readNumber } from '@/components/fields/typed-number';
import { FormActions } from '@/components/ui/form-actions';
import { SafetyNote } from '@/components/ui/safety-note';
import { broodStageLabel, shippingCautions, TEXT_LIMITS, type HandOverMethod, type SacSharesView } from '@broodsilk/shared';
import { currentNumbering, useWords } from '@/lib/i18n';
import { useCreateEntry, useHandOverForm } from '../api/entries';
import { countRule, pastDateRule, SacCountDateFields } from './sac-count-date-fields';
import { applyEntryErrors } from '../utils/entry-errors';
import { METHOD_LABELS, partyOwed, SHIPPING_PAYER_LABELS } from '../utils/labels';

interface Values {
  memberId: string;
  sacId: string;
  count: string;
  date: string;
  method: HandOverMethod;
  carrier: string;
  tracking: string;
  note: string;
}

/** The owner records spiderlings delivered to a party, by pick-up or shipment. */
export function HandOverForm({ projectId, today, sacs, onDone }: { projectId: string; today: string; sacs: SacSharesView[]; onDone?: () => void }) {
  const t = useWords();
  const info = useHandOverForm(projectId);
  const create = useCreateEntry(projectId);
  const [message, setMessage] = useState<string | null>(null);
  const [method, setMethod] = useState<HandOverMethod>('pick-up');
  const withYoung = sacs.filter((s) => s.aliveInCare > 0);
  const form = useForm<Values>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { memberId: '', sacId: '', count: '', date: today, method: 'pick-up', carrier: '', tracking: '', note: '' },
    validate: {
      memberId: (v) => (v ? null : t('page.account.handOver.whoReceives')),
      count: countRule(t),
      date: pastDateRule(t, today),
      sacId: (v) => (withYoung.length > 1 && !v ? t('page.account.form.whichSac') : null),
      carrier: textRule({ maxLength: TEXT_LIMITS.carrier }),
      tracking: textRule({ maxLength: TEXT_LIMITS.tracking }),
      note: textRule({ maxLength: TEXT_LIMITS.ledgerNote }),
    },
  });
  form.watch('method', ({ value }) => setMethod(value));

  const submit = form.onSubmit(async (v) => {
    setMessage(null);
    try {
      await create.mutateAsync({
        kind: 'hand-over',
        memberId: v.memberId,
        sacId: v.sacId || undefined,
        count: readNumber(v.count)!,
        date: readDate(v.date)!,
        method: v.method,
        carrier: v.method === 'shipment' && v.carrier.trim() ? v.carrier.trim() : undefined,
        tracking: v.method === 'shipment' && v.tracking.trim() ? v.tracking.trim() : undefined,
        note: v.note.trim() || undefined,
      });
      form.reset();
      onDone?.();
    } catch (e) {
      setMessage(applyEntryErrors(form, e));
    }
  });

  if (info.isPending) return <Text c="dimmed">{t('page.shell.loadingDots')}</Text>;
  if (info.isError) return <Alert color="clay">{info.error.message}</Alert>;
  const partyOptions = [
    { value: '', label: t('page.account.form.chooseParty') },
    ...info.data.parties.map((p) => ({ value: p.memberId, label: partyOwed(p) })),
  ];
  const { handOverStage, shippingPaidBy } = info.data;

  return (
    <form onSubmit={submit} noValidate aria-label={t('page.account.action.hand-over')}>
      <Stack maw={520} gap="sm">
        {handOverStage && (
          <Text size="sm" c="dimmed">
            {shippingPaidBy
              ? t('page.account.handOver.termsStageShipping', {
                  stage: broodStageLabel(t, handOverStage, currentNumbering()),
                  payer: SHIPPING_PAYER_LABELS[shippingPaidBy],
                })
              : t('page.account.handOver.termsStage', { stage: broodStageLabel(t, handOverStage, currentNumbering()) })}
          </Text>
        )}
        <NativeSelect label={t('page.account.handOver.to')} data={partyOptions} withAsterisk key={form.key('memberId')} {...form.getInputProps('memberId')} />
        <SacCountDateFields
          withYoung={withYoung}
          sac={{ key: form.key('sacId'), ...form.getInputProps('sacId') }}
          count={{ key: form.key('count'), ...form.getInputProps('count') }}
          date={{ key: form.key('date'), ...form.getInputProps('date') }}
        />
        <Stack gap={4}>
          <Text size="sm" fw={500} id="hand-over-method">
            {t('page.account.handOver.how')}
          </Text>
          <SegmentedControl
            aria-labelledby="hand-over-method"
            data={info.data.methods.map((m) => ({ value: m, label: METHOD_LABELS[m] }))}
            key={form.key('method')}
            {...form.getInputProps('method')}
          />
        </Stack>
        {method === 'shipment' && (
          <>
            <Group grow align="flex-start">
              <TextField
                label={t('page.account.handOver.carrier')}
                maxLength={TEXT_LIMITS.carrier}
                key={form.key('carrier')}
                {...form.getInputProps('carrier')}
              />
              <TextField
                label={t('page.account.handOver.tracking')}
                maxLength={TEXT_LIMITS.tracking}
                key={form.key('tracking')}
                {...form.getInputProps('tracking')}
              />
            </Group>
            <Alert color="amber" variant="light" title={t('page.account.handOver.shippingTitle')} role="note" data-testid="shipping-cautions">
              <List size="sm" spacing={4}>
                {shippingCautions(t).map((c) => (
                  <List.Item key={c}>{c}</List.Item>
                ))}
              </List>
            </Alert>
          </>
        )}
        <TextField label={t('page.account.form.note')} maxLength={TEXT_LIMITS.ledgerNote} key={form.key('note')} {...form.getInputProps('note')} />
        <SafetyNote text="crossBorder" />
        <FormActions message={message} loading={create.isPending} submitLabel={t('page.account.submit.hand-over')} />
      </Stack>
    </form>
  );
}

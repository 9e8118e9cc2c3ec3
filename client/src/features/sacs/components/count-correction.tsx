import { Checkbox, Select, SimpleGrid, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { BROOD_COUNT_MAX, BROOD_STAGES, TEXT_LIMITS, type BroodCountRequest, type BroodCountResponse, type BroodStage } from '@broodsilk/shared';
import { NumberField } from '@/components/fields/number-field';
import { TextAreaField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { numberRule, readNumber } from '@/components/fields/typed-number';
import { FormActions } from '@/components/ui/form-actions';
import { WarningConfirm, useWarnedSave } from '@/components/ui/warning-confirm';
import { formatInstant } from '@/lib/dates';
import { applyServerErrors } from '@/lib/form-errors';
import { useRecordBroodCount } from '../api/brood';
import { broodLabel } from '../utils/sac-view';

const COUNT = { min: 0, max: BROOD_COUNT_MAX, decimals: 0, rangeMessage: `A whole number from 0 to ${BROOD_COUNT_MAX}.` };
const stageOptions = BROOD_STAGES.map((s) => ({ value: s, label: broodLabel(s) }));

interface Values {
  stage: BroodStage;
  alive: string;
  estimated: boolean;
  reason: string;
}

/**
 * Corrects one brood count: a new count at the same instant that strikes it (both stay listed,
 * the struck one marked) with a reason; the shares follow the corrected number.
 */
export function CountCorrection({ count, timeZone, onDone }: { count: BroodCountResponse; timeZone: string; onDone: () => void }) {
  const record = useRecordBroodCount(count.sacId);
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<Values>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { stage: count.stage, alive: String(count.alive), estimated: count.estimated, reason: '' },
    validate: {
      alive: numberRule({ required: 'How many were alive?', ...COUNT }),
      reason: textRule({ required: 'Say briefly why the count was wrong.', maxLength: TEXT_LIMITS.correctionReason }),
    },
  });
  const warned = useWarnedSave(
    (body: BroodCountRequest) => record.mutateAsync(body),
    onDone,
    (e) => setMessage(applyServerErrors(form, e)),
  );
  const submit = form.onSubmit((v) => {
    setMessage(null);
    return warned.save({
      stage: v.stage,
      alive: readNumber(v.alive)!,
      estimated: v.estimated,
      lost: count.lost,
      ...(count.lossReason ? { lossReason: count.lossReason } : {}),
      corrects: count.id,
      reason: v.reason.trim(),
    });
  });
  return (
    <form onSubmit={submit} noValidate aria-label="Correct the count">
      <Stack gap="xs" maw={520}>
        <Text size="sm" c="dimmed">
          Correcting the count of {formatInstant(count.at, timeZone)} ({count.estimated ? 'about ' : ''}
          {count.alive} alive). It stays listed, struck through.
        </Text>
        <SimpleGrid cols={{ base: 2, sm: 3 }}>
          <Select label="Stage" data={stageOptions} allowDeselect={false} key={form.key('stage')} {...form.getInputProps('stage')} />
          <NumberField label="Alive" whole key={form.key('alive')} {...form.getInputProps('alive')} />
          <Checkbox label="An estimate" key={form.key('estimated')} {...form.getInputProps('estimated', { type: 'checkbox' })} />
        </SimpleGrid>
        <TextAreaField label="Why the count was wrong" maxLength={TEXT_LIMITS.correctionReason} key={form.key('reason')} {...form.getInputProps('reason')} />
        {warned.warnings && <WarningConfirm warnings={warned.warnings} loading={record.isPending} onConfirm={warned.confirm} onCancel={warned.cancel} />}
        <FormActions message={message} loading={record.isPending} submitLabel="Save the correction" onCancel={onDone} />
      </Stack>
    </form>
  );
}

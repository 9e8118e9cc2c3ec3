import { Checkbox, Select, SimpleGrid, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { BROOD_STAGES, TEXT_LIMITS, type BroodCountRequest, type BroodCountResponse, type BroodStage } from '@broodsilk/shared';
import { NumberField } from '@/components/fields/number-field';
import { TextAreaField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { numberRule, readNumber } from '@/components/fields/typed-number';
import { FormActions } from '@/components/ui/form-actions';
import { WarningConfirm, useWarnedSave } from '@/components/ui/warning-confirm';
import { formatInstant } from '@/lib/dates';
import { applyServerErrors } from '@/lib/form-errors';
import { useRecordBroodCount } from '../api/brood';
import { useWords } from '@/lib/i18n';
import { broodLabel, countRule, countText } from '../utils/sac-view';

const stageOptions = () => BROOD_STAGES.map((s) => ({ value: s, label: broodLabel(s) }));

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
  const t = useWords();
  const record = useRecordBroodCount(count.sacId);
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<Values>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { stage: count.stage, alive: String(count.alive), estimated: count.estimated, reason: '' },
    validate: {
      alive: numberRule({ required: t('page.sacs.countCorrection.aliveRequired'), ...countRule(t) }),
      reason: textRule({ required: t('page.sacs.countCorrection.reasonRequired'), maxLength: TEXT_LIMITS.correctionReason }),
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
    <form onSubmit={submit} noValidate aria-label={t('page.sacs.countCorrection.form')}>
      <Stack gap="xs" maw={520}>
        <Text size="sm" c="dimmed">
          {t('page.sacs.countCorrection.intro', { at: formatInstant(count.at, timeZone), alive: countText(t, count.alive, count.estimated) })}
        </Text>
        <SimpleGrid cols={{ base: 2, sm: 3 }}>
          <Select label={t('page.sacs.columns.stage')} data={stageOptions()} allowDeselect={false} key={form.key('stage')} {...form.getInputProps('stage')} />
          <NumberField label={t('page.sacs.columns.alive')} whole key={form.key('alive')} {...form.getInputProps('alive')} />
          <Checkbox label={t('page.sacs.countCorrection.estimate')} key={form.key('estimated')} {...form.getInputProps('estimated', { type: 'checkbox' })} />
        </SimpleGrid>
        <TextAreaField
          label={t('page.sacs.countCorrection.reason')}
          maxLength={TEXT_LIMITS.correctionReason}
          key={form.key('reason')}
          {...form.getInputProps('reason')}
        />
        {warned.warnings && <WarningConfirm warnings={warned.warnings} loading={record.isPending} onConfirm={warned.confirm} onCancel={warned.cancel} />}
        <FormActions message={message} loading={record.isPending} submitLabel={t('page.sacs.saveCorrection')} onCancel={onDone} />
      </Stack>
    </form>
  );
}

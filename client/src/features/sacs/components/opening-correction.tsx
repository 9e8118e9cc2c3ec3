import { Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { TEXT_LIMITS, type OpeningRequest, type OpeningResponse } from '@broodsilk/shared';
import { TextAreaField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { FormActions } from '@/components/ui/form-actions';
import { WarningConfirm, useWarnedSave } from '@/components/ui/warning-confirm';
import { applyServerErrors } from '@/lib/form-errors';
import { useRecordOpening } from '../api/opening';
import { openingRules, openingValues, toOpeningCounts, type OpeningValues } from '../utils/opening-values';
import { OpeningCountFields } from './opening-count-fields';
import { useWords } from '@/lib/i18n';

type Values = OpeningValues & { reason: string };

/**
 * Corrects the opening in force: a new opening that strikes it (both stay visible) with a reason;
 * the brood's first count and the shares follow the corrected numbers.
 */
export function OpeningCorrection({ opening, onDone }: { opening: OpeningResponse; onDone: () => void }) {
  const t = useWords();
  const record = useRecordOpening(opening.sacId);
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<Values>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { ...openingValues(opening), reason: '' },
    validate: { ...openingRules(t), reason: textRule({ required: t('page.sacs.opening.correctReasonRequired'), maxLength: TEXT_LIMITS.correctionReason }) },
  });
  const warned = useWarnedSave(
    (body: OpeningRequest) => record.mutateAsync(body),
    onDone,
    (e) => setMessage(applyServerErrors(form, e)),
  );
  const submit = form.onSubmit((v) => {
    setMessage(null);
    return warned.save({ ...toOpeningCounts(v), corrects: opening.id, reason: v.reason.trim() });
  });
  return (
    <form onSubmit={submit} noValidate aria-label={t('page.sacs.opening.correct')}>
      <Stack>
        <Text size="sm" c="dimmed">
          {t('page.sacs.opening.correctIntro')}
        </Text>
        <OpeningCountFields form={form} />
        <TextAreaField
          label={t('page.sacs.opening.correctReason')}
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

import { Button, Card, Group, Select, Stack, Text, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { SAC_FAILURE_REASONS, TEXT_LIMITS, type FailureNoticePreview, type SacFailureReason } from '@broodsilk/shared';
import { TextAreaField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { FormActions } from '@/components/ui/form-actions';
import { applyServerErrors, errorMessage } from '@/lib/form-errors';
import { catalogueLabels, useWords } from '@/lib/i18n';
import { useUpdateSac } from '../api/sacs';
import { useFailureNoticePreview } from '../api/failure-notice';

const FAILURE_LABELS = catalogueLabels('sacFailure');

interface Values {
  reason: string | null;
  message: string;
}

/** The request for the typed values: the message goes only when something was written (kept exactly as typed). */
export function failureRequest(v: Values): { failureReason: SacFailureReason; partnerMessage?: string } {
  return { failureReason: v.reason as SacFailureReason, ...(v.message.trim() ? { partnerMessage: v.message } : {}) };
}

/**
 * Records the sac as failed, with the keeper's own message to the partners, and shows first what
 * they will read: the same words the server sends (counts, the failure clause for each party).
 * `onCancel` folds it away again (the sac page opens it only on a press, so a stray tap starts nothing).
 */
export function FailureForm({ sacId, onCancel }: { sacId: string; onCancel?: () => void }) {
  const t = useWords();
  const update = useUpdateSac(sacId);
  const preview = useFailureNoticePreview(sacId);
  const [message, setMessage] = useState<string | null>(null);
  const [shown, setShown] = useState<FailureNoticePreview | null>(null);
  const form = useForm<Values>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { reason: null, message: '' },
    validate: {
      reason: (v) => (v ? null : t('page.failureNotice.reasonRequired')),
      message: textRule({ maxLength: TEXT_LIMITS.partnerMessage }),
    },
    // A changed reason or message makes the shown preview stale.
    onValuesChange: () => setShown(null),
  });

  async function showPreview() {
    if (form.validate().hasErrors) return;
    setMessage(null);
    try {
      setShown(await preview.mutateAsync(failureRequest(form.getValues())));
    } catch (e) {
      setMessage(errorMessage(e) || t('page.failureNotice.previewFailed'));
    }
  }

  const submit = form.onSubmit(async (v) => {
    setMessage(null);
    try {
      await update.mutateAsync({ outcome: 'failed', ...failureRequest(v) });
    } catch (e) {
      setMessage(applyServerErrors(form, e));
    }
  });

  return (
    <form onSubmit={submit} noValidate aria-label={t('page.failureNotice.reasonLabel')} style={{ gridColumn: '1 / -1' }}>
      <Stack gap="xs" maw={640}>
        <Select
          label={t('page.failureNotice.reasonLabel')}
          placeholder={t('page.failureNotice.reasonPlaceholder')}
          data={SAC_FAILURE_REASONS.map((r) => ({ value: r, label: FAILURE_LABELS[r] }))}
          w={260}
          key={form.key('reason')}
          {...form.getInputProps('reason')}
        />
        <TextAreaField
          label={t('page.failureNotice.messageLabel')}
          description={t('page.failureNotice.messageHint')}
          maxLength={TEXT_LIMITS.partnerMessage}
          minRows={3}
          key={form.key('message')}
          {...form.getInputProps('message')}
        />
        <Group>
          <Button variant="default" onClick={showPreview} loading={preview.isPending}>
            {t('page.failureNotice.preview')}
          </Button>
        </Group>
        {shown && (
          <Card withBorder padding="sm" data-testid="failure-notice-preview">
            <Title order={3} size="h5">
              {t('page.failureNotice.previewHeading')}
            </Title>
            <Text fw={700} mt="xs">
              {shown.title}
            </Text>
            <Text size="sm" style={{ whiteSpace: 'pre-wrap' }}>
              {shown.body}
            </Text>
            <Text size="sm" c="dimmed" mt="xs">
              {shown.members + shown.outsideParties === 0
                ? t('page.failureNotice.nobody')
                : [
                    shown.members ? t('page.failureNotice.membersWill', { count: shown.members }) : '',
                    shown.outsideParties ? t('page.failureNotice.outsideWill', { count: shown.outsideParties }) : '',
                  ]
                    .filter(Boolean)
                    .join(' ')}
            </Text>
          </Card>
        )}
        <FormActions message={message} loading={update.isPending} submitLabel={t('page.failureNotice.submit')} onCancel={onCancel} />
      </Stack>
    </form>
  );
}

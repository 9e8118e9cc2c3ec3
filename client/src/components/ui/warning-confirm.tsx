import { Alert, Button, Group, List, Stack, Textarea } from '@mantine/core';
import { useState } from 'react';
import { WARNINGS_FIELD, type PlausibilityWarningCode } from '@broodsilk/shared';
import { isApiError } from '@/lib/api-error';
import { useWords } from '@/lib/i18n';
import { sentence, type Sayable } from '@/lib/sentence';

/** A warning as a 422 answer carries it: its code to acknowledge, its sentence to show. */
type PlausibilityWarning = Sayable & { code: PlausibilityWarningCode };

/** The plausibility warnings of a 422 answer (empty for any other error). */
export function warningsOf(error: unknown): PlausibilityWarning[] {
  if (!isApiError(error) || error.statusCode !== 422) return [];
  return error.details
    .filter((d) => d.field === WARNINGS_FIELD && d.code)
    .map((d) => ({ code: d.code as PlausibilityWarningCode, message: d.message, key: d.key, values: d.values }));
}

/** What a request sends to save despite the warnings. */
export const acknowledge = (warnings: PlausibilityWarning[], reason: string) => ({
  acknowledgedWarnings: warnings.map((w) => w.code),
  warningReason: reason.trim(),
});

/**
 * Sends a write; on plausibility warnings keeps the request until the keeper saves it anyway with a
 * reason (`confirm`) or goes back to change it (`cancel`). Other errors go to `onError`.
 */
export function useWarnedSave<B extends object>(send: (body: B) => Promise<unknown>, onSaved: () => void, onError: (e: unknown) => void) {
  const [warned, setWarned] = useState<{ body: B; warnings: PlausibilityWarning[] } | null>(null);
  const save = async (body: B) => {
    try {
      await send(body);
      setWarned(null);
      onSaved();
    } catch (e) {
      const warnings = warningsOf(e);
      if (warnings.length) setWarned({ body, warnings });
      else onError(e);
    }
  };
  return {
    save,
    warnings: warned?.warnings ?? null,
    confirm: (reason: string) => (warned ? save({ ...warned.body, ...acknowledge(warned.warnings, reason) }) : undefined),
    cancel: () => setWarned(null),
  };
}

/**
 * The server found the value unusual and saved nothing: show why, and let the keeper save anyway
 * with a reason (kept with the record) or go back and change it.
 */
export function WarningConfirm({
  warnings,
  loading,
  onConfirm,
  onCancel,
}: {
  warnings: PlausibilityWarning[];
  loading: boolean;
  onConfirm: (reason: string) => void;
  onCancel: () => void;
}) {
  const t = useWords();
  const [reason, setReason] = useState('');
  return (
    <Alert color="amber" title={t('page.shell.warningConfirm.title')} data-testid="warning-confirm">
      <Stack gap="xs">
        <List size="sm">
          {warnings.map((w) => (
            <List.Item key={w.code}>{sentence(t, w)}</List.Item>
          ))}
        </List>
        <Textarea
          label={t('page.shell.warningConfirm.reason')}
          description={t('page.shell.warningConfirm.reasonHint')}
          rows={2}
          value={reason}
          onChange={(e) => setReason(e.currentTarget.value)}
        />
        <Group>
          <Button color="amber" loading={loading} disabled={!reason.trim()} onClick={() => onConfirm(reason)}>
            {t('page.shell.warningConfirm.saveAnyway')}
          </Button>
          <Button variant="default" onClick={onCancel}>
            {t('page.shell.warningConfirm.changeIt')}
          </Button>
        </Group>
      </Stack>
    </Alert>
  );
}

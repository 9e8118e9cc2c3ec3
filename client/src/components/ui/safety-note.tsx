import { Alert } from '@mantine/core';
import type { SafetyText } from '@broodsilk/shared';
import { useWords } from '@/lib/i18n';

/** A caution where the hands are, from the catalogue's one safety section (our wording, deferring to local law). */
export function SafetyNote({ text, values }: { text: SafetyText; values?: Record<string, unknown> }) {
  const t = useWords();
  return (
    <Alert color="amber" variant="light" role="note" title={t('safetyTitle')} data-testid={`safety-${text}`}>
      {t(`safety.${text}`, values)}
    </Alert>
  );
}

import { Alert, Button, Group, Progress, Stack, Text } from '@mantine/core';
import { useRef, useState } from 'react';
import { ApiError } from '@/lib/api-error';
import { SectionCard } from '@/components/ui/section-card';
import { downloadExport, saveFile } from '../api/download-export';
import { useWords, words } from '@/lib/i18n';
import { numberLocale } from '@/lib/numbers';

type State = { step: 'idle' } | { step: 'receiving'; bytes: number } | { step: 'saved'; bytes: number; name: string } | { step: 'failed'; message: string };

/** 1 KB = 1000 bytes, as file managers on most systems now count (IEC 80000-13 decimal prefixes). */
export function formatBytes(bytes: number): string {
  const size = new Intl.NumberFormat(numberLocale(), { maximumFractionDigits: 1 });
  if (bytes < 1000) return words('page.exportData.bytes', { count: bytes });
  if (bytes < 1_000_000) return `${size.format(bytes / 1000)} KB`;
  return `${size.format(bytes / 1_000_000)} MB`;
}

/**
 * The keeper's own copy of everything: the server builds the zip while it sends it, so the size is
 * unknown until the end; the card shows the bytes received so far and lets the keeper stop.
 */
export function ExportCard() {
  const t = useWords();
  const [state, setState] = useState<State>({ step: 'idle' });
  const abort = useRef<AbortController | null>(null);

  const start = async () => {
    abort.current = new AbortController();
    setState({ step: 'receiving', bytes: 0 });
    try {
      const file = await downloadExport((bytes) => setState({ step: 'receiving', bytes }), abort.current.signal);
      const name = file.filename ?? 'broodsilk-export.zip';
      saveFile(file, name);
      setState({ step: 'saved', bytes: file.blob.size, name });
    } catch (e) {
      if (e instanceof DOMException && e.name === 'AbortError') return setState({ step: 'idle' });
      setState({ step: 'failed', message: e instanceof ApiError ? e.message : t('page.exportData.brokeOff') });
    }
  };

  return (
    <SectionCard title={t('page.exportData.title')}>
      <Stack gap="sm">
        <Text size="sm">{t('page.exportData.text')}</Text>
        {state.step === 'receiving' ? (
          <Stack gap={4}>
            <Progress value={100} animated striped aria-label={t('page.exportData.preparing')} />
            <Group justify="space-between">
              <Text size="sm" role="status" aria-live="polite">
                {t('page.exportData.received', { size: formatBytes(state.bytes) })}
              </Text>
              <Button variant="subtle" size="xs" onClick={() => abort.current?.abort()}>
                {t('page.exportData.stop')}
              </Button>
            </Group>
          </Stack>
        ) : (
          <Group>
            <Button onClick={() => void start()}>{t('page.exportData.download')}</Button>
          </Group>
        )}
        {state.step === 'saved' && (
          <Text size="sm" role="status">
            {t('page.exportData.saved', { name: state.name, size: formatBytes(state.bytes) })}
          </Text>
        )}
        {state.step === 'failed' && (
          <Alert color="clay" title={t('page.exportData.failed')}>
            {state.message}
          </Alert>
        )}
      </Stack>
    </SectionCard>
  );
}

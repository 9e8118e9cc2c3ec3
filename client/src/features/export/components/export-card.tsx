import { Alert, Button, Group, Progress, Stack, Text } from '@mantine/core';
import { useRef, useState } from 'react';
import { ApiError } from '@/lib/api-error';
import { SectionCard } from '@/components/ui/section-card';
import { downloadExport, saveFile } from '../api/download-export';

type State = { step: 'idle' } | { step: 'receiving'; bytes: number } | { step: 'saved'; bytes: number; name: string } | { step: 'failed'; message: string };

const size = new Intl.NumberFormat(undefined, { maximumFractionDigits: 1 });
/** 1 KB = 1000 bytes, as file managers on most systems now count (IEC 80000-13 decimal prefixes). */
export function formatBytes(bytes: number): string {
  if (bytes < 1000) return `${bytes} bytes`;
  if (bytes < 1_000_000) return `${size.format(bytes / 1000)} KB`;
  return `${size.format(bytes / 1_000_000)} MB`;
}

/**
 * The keeper's own copy of everything: the server builds the zip while it sends it, so the size is
 * unknown until the end; the card shows the bytes received so far and lets the keeper stop.
 */
export function ExportCard() {
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
      setState({ step: 'failed', message: e instanceof ApiError ? e.message : 'The download broke off. Check your connection and try again.' });
    }
  };

  return (
    <SectionCard title="Your data">
      <Stack gap="sm">
        <Text size="sm">
          One zip file with everything you keep here: your collection with its molts, feedings and photos, and for each project you belong to its pairings,
          sacs, care log, openings and counts, and the ledger entries your role lets you see. Each kind is a JSON file; dates are ISO 8601.
        </Text>
        {state.step === 'receiving' ? (
          <Stack gap={4}>
            <Progress value={100} animated striped aria-label="Preparing your data" />
            <Group justify="space-between">
              <Text size="sm" role="status" aria-live="polite">
                {formatBytes(state.bytes)} received
              </Text>
              <Button variant="subtle" size="xs" onClick={() => abort.current?.abort()}>
                Stop
              </Button>
            </Group>
          </Stack>
        ) : (
          <Group>
            <Button onClick={() => void start()}>Download my data</Button>
          </Group>
        )}
        {state.step === 'saved' && (
          <Text size="sm" role="status">
            Saved {state.name} ({formatBytes(state.bytes)}).
          </Text>
        )}
        {state.step === 'failed' && (
          <Alert color="clay" title="The download did not finish">
            {state.message}
          </Alert>
        )}
      </Stack>
    </SectionCard>
  );
}

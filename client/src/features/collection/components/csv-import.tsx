import { Alert, Button, FileButton, Group, List, Stack, Text } from '@mantine/core';
import { isApiError } from '@/lib/api-error';
import type { Words } from '@broodsilk/shared';
import { useWords } from '@/lib/i18n';
import { ANIMALS_CSV_EXPORT_URL, useImportAnimalsCsv } from '../api/csv';

/** The server names a refused row "line 12"; the reader sees it in their words. */
function rowName(t: Words, field: string): string {
  const m = /^line (\d+)$/.exec(field);
  return m ? t('page.collection.csv.line', { number: Number(m[1]) }) : field;
}

/** "line 12" first by its number, so the list reads down the file. */
function lineNumber(field: string): number {
  const m = /(\d+)/.exec(field);
  return m ? Number(m[1]) : Number.MAX_SAFE_INTEGER;
}

/** The import's answer: how many came in, or every refused row with its line and reason. */
export function CsvImportResult({ imported, error, onClose }: { imported?: number; error?: unknown; onClose: () => void }) {
  const t = useWords();
  const closable = { variant: 'light', withCloseButton: true, closeButtonLabel: t('page.collection.csv.close'), onClose } as const;
  if (imported !== undefined) {
    return (
      <Alert color="moss" {...closable} title={<span className="tone-ok">{t('page.collection.csv.done')}</span>}>
        <Text size="sm">{t('page.collection.csv.imported', { count: imported })}</Text>
      </Alert>
    );
  }
  if (!error) return null;
  const rows = isApiError(error) ? [...error.details].sort((a, b) => lineNumber(a.field) - lineNumber(b.field)) : [];
  return (
    <Alert color="clay" {...closable} title={<span className="tone-failed">{t('page.collection.csv.notImported')}</span>}>
      <Stack gap="xs">
        <Text size="sm">{isApiError(error) ? error.message : t('page.collection.csv.notSent')}</Text>
        {rows.length > 0 && (
          <List size="sm" spacing={2} aria-label={t('page.collection.csv.problemRows')} style={{ maxHeight: 320, overflowY: 'auto' }}>
            {rows.map((r, i) => (
              <List.Item key={`${r.field}-${i}`}>
                <b>{rowName(t, r.field)}:</b> {r.message}
              </List.Item>
            ))}
          </List>
        )}
      </Stack>
    </Alert>
  );
}

/** Export and import buttons for the collection's CSV file. */
export function CsvTools() {
  const t = useWords();
  const importCsv = useImportAnimalsCsv();
  return (
    <Stack gap="xs" maw={560}>
      <Group gap="xs">
        <Button component="a" href={ANIMALS_CSV_EXPORT_URL} download variant="default" size="md">
          {t('page.collection.csv.exportButton')}
        </Button>
        <FileButton
          accept=".csv,text/csv"
          inputProps={{ 'aria-label': t('page.collection.csv.chooseFile') }}
          onChange={(file) => file && importCsv.mutate(file)}
        >
          {(props) => (
            <Button {...props} variant="default" size="md" loading={importCsv.isPending}>
              {t('page.collection.csv.importButton')}
            </Button>
          )}
        </FileButton>
      </Group>
      <CsvImportResult imported={importCsv.data?.imported} error={importCsv.error ?? undefined} onClose={() => importCsv.reset()} />
    </Stack>
  );
}

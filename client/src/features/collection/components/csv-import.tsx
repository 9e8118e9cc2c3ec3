import { Alert, Button, FileButton, Group, List, Stack, Text } from '@mantine/core';
import { isApiError } from '@/lib/api-error';
import { ANIMALS_CSV_EXPORT_URL, useImportAnimalsCsv } from '../api/csv';

/** "line 12" first by its number, so the list reads down the file. */
function lineNumber(field: string): number {
  const m = /(\d+)/.exec(field);
  return m ? Number(m[1]) : Number.MAX_SAFE_INTEGER;
}

/** The import's answer: how many came in, or every refused row with its line and reason. */
export function CsvImportResult({ imported, error, onClose }: { imported?: number; error?: unknown; onClose: () => void }) {
  if (imported !== undefined) {
    return (
      <Alert color="moss" variant="light" withCloseButton closeButtonLabel="Close" onClose={onClose} title={<span className="tone-ok">Import done</span>}>
        <Text size="sm">{imported === 1 ? '1 animal was imported.' : `${imported} animals were imported.`}</Text>
      </Alert>
    );
  }
  if (!error) return null;
  const rows = isApiError(error) ? [...error.details].sort((a, b) => lineNumber(a.field) - lineNumber(b.field)) : [];
  return (
    <Alert
      color="clay"
      variant="light"
      withCloseButton
      closeButtonLabel="Close"
      onClose={onClose}
      title={<span className="tone-failed">The file was not imported</span>}
    >
      <Stack gap="xs">
        <Text size="sm">{isApiError(error) ? error.message : 'The file could not be sent. Try again.'}</Text>
        {rows.length > 0 && (
          <List size="sm" spacing={2} aria-label="Rows with problems" style={{ maxHeight: 320, overflowY: 'auto' }}>
            {rows.map((r, i) => (
              <List.Item key={`${r.field}-${i}`}>
                <b>{r.field.replace(/^line/, 'Line')}:</b> {r.message}
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
  const importCsv = useImportAnimalsCsv();
  return (
    <Stack gap="xs" maw={560}>
      <Group gap="xs">
        <Button component="a" href={ANIMALS_CSV_EXPORT_URL} download variant="default" size="md">
          Export CSV
        </Button>
        <FileButton accept=".csv,text/csv" inputProps={{ 'aria-label': 'Choose a CSV file to import' }} onChange={(file) => file && importCsv.mutate(file)}>
          {(props) => (
            <Button {...props} variant="default" size="md" loading={importCsv.isPending}>
              Import CSV
            </Button>
          )}
        </FileButton>
      </Group>
      <CsvImportResult imported={importCsv.data?.imported} error={importCsv.error ?? undefined} onClose={() => importCsv.reset()} />
    </Stack>
  );
}

import { Alert, Stack } from '@mantine/core';
import type { PairingWarning } from '@broodsilk/shared';
import { SEVERITY_COLOURS } from '../utils/labels';
import { catalogueLabels, words } from '@/lib/i18n';

const TITLES = catalogueLabels('severity');

/** Pairing warnings (molt after pairing, male clock, loan due back), most severe first as the server sends them. */
export function WarningsList({ warnings }: { warnings: PairingWarning[] }) {
  if (warnings.length === 0) return null;
  return (
    <Stack gap="xs" data-testid="project-warnings">
      {warnings.map((w, i) => (
        // a project with several males can carry the same warning once per male
        <Alert key={`${w.code}-${i}`} color={SEVERITY_COLOURS[w.severity]} title={TITLES[w.severity]} variant="light">
          {w.params ? words(`warning.${w.code}`, w.params) : w.message}
        </Alert>
      ))}
    </Stack>
  );
}

import { Alert, Stack } from '@mantine/core';
import type { PairingWarning } from '@broodsilk/shared';
import { SEVERITY_COLOURS } from '../utils/labels';

const TITLES: Record<PairingWarning['severity'], string> = { danger: 'Needs a decision', warning: 'Keep an eye on this', info: 'Good to know' };

/** Pairing warnings (molt after pairing, male clock, loan due back), most severe first as the server sends them. */
export function WarningsList({ warnings }: { warnings: PairingWarning[] }) {
  if (warnings.length === 0) return null;
  return (
    <Stack gap="xs" data-testid="project-warnings">
      {warnings.map((w) => (
        <Alert key={w.code} color={SEVERITY_COLOURS[w.severity]} title={TITLES[w.severity]} variant="light">
          {w.message}
        </Alert>
      ))}
    </Stack>
  );
}

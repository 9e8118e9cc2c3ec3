import { Text } from '@mantine/core';
import { dayNumber, pullWindowState, type SacResponse } from '@broodsilk/shared';
import { useWhen, WhenFields } from '@/components/fields/when-fields';
import { ConfirmAction } from '@/components/ui/confirm-action';

interface PullConfirmationProps {
  opened: boolean;
  onClose: () => void;
  sac: SacResponse;
  timeZone: string;
  pending: boolean;
  onConfirm: (pulledAt: string) => void;
}

/** A pull outside the window is the keeper's call: said plainly, not refused. */
export function pullWarning(sac: Pick<SacResponse, 'layDate' | 'pullWindow'>, day: string): string | null {
  const window = { fromDay: sac.pullWindow.fromDay, toDay: sac.pullWindow.toDay };
  const state = pullWindowState(sac.layDate, day, window);
  const n = dayNumber(sac.layDate, day);
  if (state === 'not-yet')
    return `That is day ${n}, before this sac's pull window (days ${window.fromDay}–${window.toDay}). Eggs pulled early are more likely to fail.`;
  if (state === 'past') return `That is day ${n}, after this sac's pull window (days ${window.fromDay}–${window.toDay}).`;
  return null;
}

/** Asks before recording the pull, with the day and time it happened (now unless changed). */
export function PullConfirmation({ opened, onClose, sac, timeZone, pending, onConfirm }: PullConfirmationProps) {
  const when = useWhen(timeZone);
  return (
    <ConfirmAction
      opened={opened}
      onClose={onClose}
      title="Record the pull"
      confirmLabel="Record the pull"
      pending={pending}
      ready={when.instant !== null}
      warning={when.day ? pullWarning(sac, when.day) : null}
      onConfirm={() => when.instant && onConfirm(when.instant)}
    >
      <Text size="sm">
        This marks the sac as taken from the mother into the incubator. Rolls are then due from the time of the pull. Change the day or time if the pull was
        earlier.
      </Text>
      <WhenFields when={when} dateLabel="Pulled on" />
    </ConfirmAction>
  );
}

import { Text } from '@mantine/core';
import { dayNumber, pullWindowState, type SacResponse } from '@broodsilk/shared';
import { useWhen, WhenFields } from '@/components/fields/when-fields';
import { ConfirmAction } from '@/components/ui/confirm-action';
import { useWords, words } from '@/lib/i18n';

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
  if (state === 'not-yet') return words('page.sacs.pull.early', { day: n, from: window.fromDay, to: window.toDay });
  if (state === 'past') return words('page.sacs.pull.late', { day: n, from: window.fromDay, to: window.toDay });
  return null;
}

/** Asks before recording the pull, with the day and time it happened (now unless changed). */
export function PullConfirmation({ opened, onClose, sac, timeZone, pending, onConfirm }: PullConfirmationProps) {
  const t = useWords();
  const when = useWhen(timeZone);
  return (
    <ConfirmAction
      opened={opened}
      onClose={onClose}
      title={t('page.sacs.pull.title')}
      confirmLabel={t('page.sacs.pull.title')}
      pending={pending}
      ready={when.instant !== null}
      warning={when.day ? pullWarning(sac, when.day) : null}
      onConfirm={() => when.instant && onConfirm(when.instant)}
    >
      <Text size="sm">{t('page.sacs.pull.text')}</Text>
      <WhenFields when={when} dateLabel={t('page.sacs.pull.pulledOn')} />
    </ConfirmAction>
  );
}

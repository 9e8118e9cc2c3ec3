import { Table, Text } from '@mantine/core';
import type { ReactNode } from 'react';
import { useWords } from '@/lib/i18n';

/** Narrower than this, a phone (390 px less padding) cannot show the whole table. */
const PHONE_WIDTH = 340;

/**
 * A table that scrolls sideways on a narrow screen and says so, instead of clipping columns.
 * The scroll area is focusable and named, so it can be scrolled from the keyboard; it scrolls
 * natively, as Mantine's ScrollArea would scroll an inner element that cannot take focus (axe
 * "scrollable-region-focusable" on a phone).
 */
export function ScrollTable({ minWidth, label, children }: { minWidth: number; label: string; children: ReactNode }) {
  const t = useWords();
  return (
    <>
      {minWidth > PHONE_WIDTH && (
        <Text size="xs" c="dimmed" hiddenFrom="sm" aria-hidden>
          {t('page.shell.swipeTable')}
        </Text>
      )}
      <Table.ScrollContainer type="native" minWidth={minWidth} tabIndex={0} role="region" aria-label={label}>
        {children}
      </Table.ScrollContainer>
    </>
  );
}

import { Card, Group, Title } from '@mantine/core';
import type { ReactNode } from 'react';

interface SectionCardProps {
  title: string;
  children: ReactNode;
  testId?: string;
  /** Something to do, shown beside the title. */
  action?: ReactNode;
  /** A coloured left edge for a card that needs attention now. */
  accent?: 'amber' | 'clay';
  /** Smaller title, for dense grids of cards such as the dashboard. */
  compact?: boolean;
}

/** A titled card: the building block of the project, sac, account and dashboard pages. */
export function SectionCard({ title, children, testId, action, accent, compact = false }: SectionCardProps) {
  return (
    <Card withBorder data-testid={testId} style={accent ? { borderLeft: `6px solid var(--mantine-color-${accent}-5)` } : undefined}>
      <Group justify="space-between" mb={compact ? 'xs' : 'sm'} wrap="nowrap">
        <Title order={3} size={compact ? 'h5' : 'h4'}>
          {title}
        </Title>
        {action}
      </Group>
      {children}
    </Card>
  );
}

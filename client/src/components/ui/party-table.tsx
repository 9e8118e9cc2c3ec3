import { Table } from '@mantine/core';
import type { ReactNode } from 'react';
import { ScrollTable } from './scroll-table';

/** One column of a table with a row per party of a project. */
export interface PartyColumn<R> {
  /** The column heading, in the reader's words. */
  header: string;
  cell: (row: R) => ReactNode;
  /** A count or amount: lined up on the right. */
  numeric?: boolean;
  /** Left out on a phone; the first cell says it again in small print where it matters. */
  wide?: boolean;
  bold?: boolean;
  /** A test id for the cell, from its row. */
  testId?: (row: R) => string;
}

interface PartyTableProps<R> {
  /** Names the table and its scroll area (screen readers, tests). */
  label: string;
  /** Narrower than this, the table scrolls sideways (see ScrollTable). */
  minWidth: number;
  rows: readonly R[];
  rowKey: (row: R) => string;
  columns: readonly PartyColumn<R>[];
  striped?: boolean;
  small?: boolean;
  testId?: string;
}

/** A table with one row per party (terms, shares, balances, members), one look wherever it stands. */
export function PartyTable<R>({ label, minWidth, rows, rowKey, columns, striped, small, testId }: PartyTableProps<R>) {
  const side = (c: PartyColumn<R>) => ({ ta: c.numeric ? ('right' as const) : undefined, visibleFrom: c.wide ? 'sm' : undefined });
  return (
    <ScrollTable minWidth={minWidth} label={label}>
      <Table aria-label={label} striped={striped} verticalSpacing={small ? 4 : 'xs'} fz={small ? 'sm' : undefined} data-testid={testId}>
        <Table.Thead>
          <Table.Tr>
            {columns.map((c) => (
              <Table.Th key={c.header} {...side(c)}>
                {c.header}
              </Table.Th>
            ))}
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {rows.map((row) => (
            <Table.Tr key={rowKey(row)}>
              {columns.map((c) => (
                <Table.Td key={c.header} {...side(c)} fw={c.bold ? 600 : undefined} data-testid={c.testId?.(row)}>
                  {c.cell(row)}
                </Table.Td>
              ))}
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </ScrollTable>
  );
}

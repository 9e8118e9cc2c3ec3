import { Alert, Badge, Group, Stack, Table, Text } from '@mantine/core';
import { ScrollTable } from '@/components/ui/scroll-table';
import { useBalances } from '../api/balances';
import { PROVISIONAL_SHARES, countWords, formatMoney } from '@broodsilk/shared';

/** Per party: share, what went out, what is still owed in spiderlings; then the netted money between parties. */
export function BalancesPanel({ projectId }: { projectId: string }) {
  const balances = useBalances(projectId);
  if (balances.isPending) return <Text c="dimmed">Loading balances…</Text>;
  if (balances.isError) return <Alert color="clay">{balances.error.message}</Alert>;
  const b = balances.data;
  return (
    <Stack gap="sm" data-testid="account-balances">
      {b.provisional && (
        <Text size="sm" className="tone-due">
          {PROVISIONAL_SHARES}
        </Text>
      )}
      {b.settled && (
        <Group>
          <Badge color="moss" variant="light" tt="none">
            Settled: nothing is owed
          </Badge>
        </Group>
      )}
      <ScrollTable minWidth={520} label="Balances">
        <Table aria-label="Balances" striped verticalSpacing="xs">
          <Table.Thead>
            <Table.Tr>
              <Table.Th>Party</Table.Th>
              <Table.Th ta="right">Still owed</Table.Th>
              <Table.Th ta="right">Share</Table.Th>
              <Table.Th ta="right">Handed over</Table.Th>
              <Table.Th ta="right">Sold</Table.Th>
              <Table.Th ta="right">Cashed out</Table.Th>
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {b.parties.map((p) => (
              <Table.Tr key={p.memberId}>
                <Table.Td>
                  {p.name}
                  {p.memberId === b.ownerMemberId && (
                    <Text span size="xs" c="dimmed">
                      {' '}
                      (runs the project)
                    </Text>
                  )}
                </Table.Td>
                <Table.Td ta="right" data-testid={`owed-${p.memberId}`}>
                  {p.owedSpiderlings > 0 ? (
                    <Text span fw={600} className="tone-due">
                      {p.owedSpiderlings}
                    </Text>
                  ) : p.owedSpiderlings < 0 ? (
                    <Text span className="tone-failed">
                      {-p.owedSpiderlings} over the share
                    </Text>
                  ) : (
                    <Text span className="tone-ok">
                      0
                    </Text>
                  )}
                </Table.Td>
                <Table.Td ta="right">{countWords(p.share, b.provisional)}</Table.Td>
                <Table.Td ta="right">
                  {p.handedOver}
                  {p.unconfirmedHandOvers > 0 && (
                    <Text span size="xs" className="tone-due">
                      {' '}
                      ({p.unconfirmedHandOvers} not confirmed)
                    </Text>
                  )}
                </Table.Td>
                <Table.Td ta="right">{p.sold}</Table.Td>
                <Table.Td ta="right">{p.cashedOut}</Table.Td>
              </Table.Tr>
            ))}
          </Table.Tbody>
        </Table>
      </ScrollTable>
      <Stack gap={4} data-testid="account-debts">
        <Text size="sm" fw={600}>
          Money between parties
        </Text>
        {b.debts.length === 0 ? (
          <Text size="sm" className="tone-ok">
            No money is owed between parties.
          </Text>
        ) : (
          b.debts.map((d) => (
            <Text key={`${d.fromPartyId}-${d.toPartyId}`} size="sm" fw={600} className="tone-due">
              {d.fromName} owes {d.toName} {formatMoney(d.amountMinor, d.currency)}
            </Text>
          ))
        )}
      </Stack>
      {b.problems.length > 0 && (
        <Alert color="clay" title="Entries that do not count">
          <Stack gap={2}>
            {b.problems.map((p) => (
              <Text key={p.entryId} size="sm">
                {p.message}
              </Text>
            ))}
          </Stack>
        </Alert>
      )}
    </Stack>
  );
}

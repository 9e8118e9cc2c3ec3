import { Alert, Badge, Group, Stack, Text } from '@mantine/core';
import { PartyTable } from '@/components/ui/party-table';
import { useBalances } from '../api/balances';
import { PROVISIONAL_SHARES, countWords, formatMoney } from '@broodsilk/shared';

/** Spiderlings still owed to a party; a negative count is more than the share. */
function Owed({ count }: { count: number }) {
  if (count > 0)
    return (
      <Text span fw={600} className="tone-due">
        {count}
      </Text>
    );
  if (count < 0)
    return (
      <Text span className="tone-failed">
        {-count} over the share
      </Text>
    );
  return (
    <Text span className="tone-ok">
      0
    </Text>
  );
}

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
      <PartyTable
        label="Balances"
        minWidth={520}
        striped
        rows={b.parties}
        rowKey={(p) => p.memberId}
        columns={[
          {
            header: 'Party',
            cell: (p) => (
              <>
                {p.name}
                {p.memberId === b.ownerMemberId && (
                  <Text span size="xs" c="dimmed">
                    {' '}
                    (runs the project)
                  </Text>
                )}
              </>
            ),
          },
          { header: 'Still owed', numeric: true, testId: (p) => `owed-${p.memberId}`, cell: (p) => <Owed count={p.owedSpiderlings} /> },
          { header: 'Share', numeric: true, cell: (p) => countWords(p.share, b.provisional) },
          {
            header: 'Handed over',
            numeric: true,
            cell: (p) => (
              <>
                {p.handedOver}
                {p.unconfirmedHandOvers > 0 && (
                  <Text span size="xs" className="tone-due">
                    {' '}
                    ({p.unconfirmedHandOvers} not confirmed)
                  </Text>
                )}
              </>
            ),
          },
          { header: 'Sold', numeric: true, cell: (p) => p.sold },
          { header: 'Cashed out', numeric: true, cell: (p) => p.cashedOut },
        ]}
      />
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

import { Alert, Badge, Group, Stack, Text } from '@mantine/core';
import { PartyTable } from '@/components/ui/party-table';
import { useBalances } from '../api/balances';
import { formatMoney } from '@broodsilk/shared';
import { useWords } from '@/lib/i18n';
import { sentence } from '@/lib/sentence';

/** Spiderlings still owed to a party; a negative count is more than the share. */
function Owed({ count }: { count: number }) {
  const t = useWords();
  if (count > 0)
    return (
      <Text span fw={600} className="tone-due">
        {count}
      </Text>
    );
  if (count < 0)
    return (
      <Text span className="tone-failed">
        {t('page.account.balances.overShare', { count: -count })}
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
  const t = useWords();
  const balances = useBalances(projectId);
  if (balances.isPending) return <Text c="dimmed">{t('page.account.balances.loading')}</Text>;
  if (balances.isError) return <Alert color="clay">{balances.error.message}</Alert>;
  const b = balances.data;
  return (
    <Stack gap="sm" data-testid="account-balances">
      {b.provisional && (
        <Text size="sm" className="tone-due">
          {t('page.account.provisionalShares')}
        </Text>
      )}
      {b.settled && (
        <Group>
          <Badge color="moss" variant="light" tt="none">
            {t('page.account.balances.settled')}
          </Badge>
        </Group>
      )}
      <PartyTable
        label={t('page.account.balances.label')}
        minWidth={520}
        striped
        rows={b.parties}
        rowKey={(p) => p.memberId}
        columns={[
          {
            header: t('page.account.party'),
            cell: (p) => (
              <>
                {p.name}
                {p.memberId === b.ownerMemberId && (
                  <Text span size="xs" c="dimmed">
                    {' '}
                    {t('page.account.balances.runsProject')}
                  </Text>
                )}
              </>
            ),
          },
          { header: t('page.account.balances.stillOwed'), numeric: true, testId: (p) => `owed-${p.memberId}`, cell: (p) => <Owed count={p.owedSpiderlings} /> },
          { header: t('page.account.share'), numeric: true, cell: (p) => (b.provisional ? t('page.account.about', { count: p.share }) : p.share) },
          {
            header: t('page.account.balances.handedOver'),
            numeric: true,
            cell: (p) => (
              <>
                {p.handedOver}
                {p.unconfirmedHandOvers > 0 && (
                  <Text span size="xs" className="tone-due">
                    {' '}
                    {t('page.account.balances.unconfirmed', { count: p.unconfirmedHandOvers })}
                  </Text>
                )}
              </>
            ),
          },
          { header: t('page.account.balances.sold'), numeric: true, cell: (p) => p.sold },
          { header: t('page.account.balances.cashedOut'), numeric: true, cell: (p) => p.cashedOut },
        ]}
      />
      <Stack gap={4} data-testid="account-debts">
        <Text size="sm" fw={600}>
          {t('page.account.balances.moneyHeading')}
        </Text>
        {b.debts.length === 0 ? (
          <Text size="sm" className="tone-ok">
            {t('page.account.balances.noMoney')}
          </Text>
        ) : (
          b.debts.map((d) => (
            <Text key={`${d.fromPartyId}-${d.toPartyId}`} size="sm" fw={600} className="tone-due">
              {t('page.account.balances.owes', { from: d.fromName, to: d.toName, amount: formatMoney(d.amountMinor, d.currency) })}
            </Text>
          ))
        )}
      </Stack>
      {b.problems.length > 0 && (
        <Alert color="clay" title={t('page.account.balances.problemsTitle')}>
          <Stack gap={2}>
            {b.problems.map((p) => (
              <Text key={p.entryId} size="sm">
                {sentence(t, p)}
              </Text>
            ))}
          </Stack>
        </Alert>
      )}
    </Stack>
  );
}

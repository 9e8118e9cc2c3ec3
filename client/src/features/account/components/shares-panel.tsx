import { Alert, Badge, Card, Group, List, Stack, Text } from '@mantine/core';
import { PartyTable } from '@/components/ui/party-table';
import { formatMoney, label, type SacSharesView } from '@broodsilk/shared';
import { formatInstant } from '@/lib/dates';
import { useWords } from '@/lib/i18n';
import { useShares } from '../api/shares';

function SacShares({ sac, timeZone }: { sac: SacSharesView; timeZone: string }) {
  const t = useWords();
  const about = (n: number) => (sac.estimated ? t('page.account.about', { count: n }) : n);
  const failed = sac.outcome === 'failed';
  return (
    <Card withBorder padding="sm" data-testid={`shares-sac-${sac.sacId}`}>
      <Group justify="space-between" mb="xs" wrap="wrap">
        <Text fw={600}>{t('page.account.shares.sacLaid', { date: sac.layDate })}</Text>
        {failed ? (
          <Badge color="clay" variant="light" tt="none">
            {t('page.account.shares.failed')}
          </Badge>
        ) : (
          <Text size="sm" c="dimmed">
            {t('page.account.shares.counted', { count: about(sac.count), inCare: about(sac.aliveInCare), withdrawn: sac.withdrawn })}
          </Text>
        )}
      </Group>
      {sac.estimated && (
        <Badge color="amber" variant="light" tt="none" mb="xs">
          {t('page.account.shares.estimated')}
        </Badge>
      )}
      {sac.failure && (
        <Text size="sm" className="tone-failed" mb="xs">
          {sac.failure}
        </Text>
      )}
      {sac.parties.length > 0 && (
        <PartyTable
          label={t('page.account.shares.tableLabel', { date: sac.layDate })}
          minWidth={420}
          small
          rows={sac.parties}
          rowKey={(p) => p.memberId}
          columns={[
            { header: t('page.account.party'), cell: (p) => p.name },
            { header: t('page.account.share'), numeric: true, bold: true, cell: (p) => p.count },
            { header: t('page.account.shares.fixed'), numeric: true, cell: (p) => p.fixed },
            { header: t('page.account.shares.proportional'), numeric: true, cell: (p) => p.proportional },
            {
              header: t('page.account.shares.exactQuota'),
              numeric: true,
              cell: (p) => (
                <>
                  {p.exactQuota}
                  {p.roundedUp && (
                    <Text span size="xs" c="dimmed">
                      {' '}
                      {t('page.account.shares.roundedUp')}
                    </Text>
                  )}
                </>
              ),
            },
          ]}
        />
      )}
      {sac.explanation.length > 0 && (
        <Stack gap={2} mt="xs">
          <Text size="sm" fw={500}>
            {t('page.account.shares.howHeading')}
          </Text>
          <List size="sm" spacing={2}>
            {sac.explanation.map((line) => (
              <List.Item key={line}>{line}</List.Item>
            ))}
          </List>
        </Stack>
      )}
      {sac.change && (
        <Stack gap={2} mt="xs" data-testid="share-change">
          <Text size="sm" fw={500} className="tone-due">
            {t('page.account.shares.changeHeading', { when: formatInstant(sac.change.changedAt, timeZone) })}
          </Text>
          {sac.change.reasons.map((r) => (
            <Text key={r} size="sm">
              {r}
            </Text>
          ))}
          <List size="sm" spacing={2}>
            {sac.change.lines.map((line) => (
              <List.Item key={line}>{line}</List.Item>
            ))}
          </List>
        </Stack>
      )}
    </Card>
  );
}

/** Shares per sac with the rule in plain words, and the project's totals. */
export function SharesPanel({ projectId, timeZone }: { projectId: string; timeZone: string }) {
  const t = useWords();
  const shares = useShares(projectId);
  if (shares.isPending) return <Text c="dimmed">{t('page.account.shares.loading')}</Text>;
  if (shares.isError) return <Alert color="clay">{shares.error.message}</Alert>;
  const s = shares.data;
  return (
    <Stack gap="sm" data-testid="account-shares">
      {s.terms ? (
        <Text size="sm" c="dimmed">
          {t('page.account.shares.terms', {
            number: s.terms.number,
            price: formatMoney(s.terms.pricePerSpiderlingMinor, s.terms.currency),
            clause: label(t, 'failureClauseText', s.terms.failureClause),
          })}
        </Text>
      ) : (
        <Alert color="amber">{t('page.account.shares.noTerms')}</Alert>
      )}
      {s.notices.map((n) => (
        <Text key={n} size="sm" className="tone-due">
          {n}
        </Text>
      ))}
      {s.sacs.length === 0 && s.terms && <Text c="dimmed">{t('page.account.shares.noSac')}</Text>}
      {s.sacs.map((sac) => (
        <SacShares key={sac.sacId} sac={sac} timeZone={timeZone} />
      ))}
      {s.totals.length > 0 && (
        <Text size="sm">
          <Text span fw={600}>
            {t('page.account.shares.wholeAccount')}{' '}
          </Text>
          {s.totals.map((t) => `${t.name} ${t.count}`).join(' · ')}
        </Text>
      )}
    </Stack>
  );
}

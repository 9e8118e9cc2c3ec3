import { Alert, Badge, Card, Group, List, Stack, Text } from '@mantine/core';
import { PartyTable } from '@/components/ui/party-table';
import { countWords, formatMoney, type SacSharesView } from '@broodsilk/shared';
import { formatDate, formatInstant } from '@/lib/dates';
import { useShares } from '../api/shares';

function SacShares({ sac, timeZone }: { sac: SacSharesView; timeZone: string }) {
  const failed = sac.outcome === 'failed';
  return (
    <Card withBorder padding="sm" data-testid={`shares-sac-${sac.sacId}`}>
      <Group justify="space-between" mb="xs" wrap="wrap">
        <Text fw={600}>Sac laid {formatDate(sac.layDate)}</Text>
        {failed ? (
          <Badge color="clay" variant="light" tt="none">
            Failed
          </Badge>
        ) : (
          <Text size="sm" c="dimmed">
            {countWords(sac.count, sac.estimated)} young counted ({countWords(sac.aliveInCare, sac.estimated)} in care, {sac.withdrawn} handed over, sold or
            cashed out)
          </Text>
        )}
      </Group>
      {sac.estimated && (
        <Badge color="amber" variant="light" tt="none" mb="xs">
          Provisional: the count is an estimate
        </Badge>
      )}
      {sac.failure && (
        <Text size="sm" className="tone-failed" mb="xs">
          {sac.failure}
        </Text>
      )}
      {sac.parties.length > 0 && (
        <PartyTable
          label={`Shares of the sac laid ${formatDate(sac.layDate)}`}
          minWidth={420}
          small
          rows={sac.parties}
          rowKey={(p) => p.memberId}
          columns={[
            { header: 'Party', cell: (p) => p.name },
            { header: 'Share', numeric: true, bold: true, cell: (p) => p.count },
            { header: 'Fixed', numeric: true, cell: (p) => p.fixed },
            { header: 'Proportional', numeric: true, cell: (p) => p.proportional },
            {
              header: 'Exact quota',
              numeric: true,
              cell: (p) => (
                <>
                  {p.exactQuota}
                  {p.roundedUp && (
                    <Text span size="xs" c="dimmed">
                      {' '}
                      (rounded up)
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
            How the shares are worked out
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
            What changed and why · {formatInstant(sac.change.changedAt, timeZone)}
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
  const shares = useShares(projectId);
  if (shares.isPending) return <Text c="dimmed">Loading shares…</Text>;
  if (shares.isError) return <Alert color="clay">{shares.error.message}</Alert>;
  const s = shares.data;
  return (
    <Stack gap="sm" data-testid="account-shares">
      {s.terms ? (
        <Text size="sm" c="dimmed">
          Terms version {s.terms.number} in force · {formatMoney(s.terms.pricePerSpiderlingMinor, s.terms.currency)} per spiderling for a cash-out ·{' '}
          {s.terms.failureClauseText}
        </Text>
      ) : (
        <Alert color="amber">No version of the terms is in force yet, so there are no shares. Every partner must accept the terms first.</Alert>
      )}
      {s.notices.map((n) => (
        <Text key={n} size="sm" className="tone-due">
          {n}
        </Text>
      ))}
      {s.sacs.length === 0 && s.terms && <Text c="dimmed">No sac has been counted yet.</Text>}
      {s.sacs.map((sac) => (
        <SacShares key={sac.sacId} sac={sac} timeZone={timeZone} />
      ))}
      {s.totals.length > 0 && (
        <Text size="sm">
          <Text span fw={600}>
            Whole account:{' '}
          </Text>
          {s.totals.map((t) => `${t.name} ${t.count}`).join(' · ')}
        </Text>
      )}
    </Stack>
  );
}

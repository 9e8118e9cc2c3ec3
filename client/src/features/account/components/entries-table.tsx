import { Alert, Anchor, Card, Group, Stack, Table, Text } from '@mantine/core';
import type { ReactNode } from 'react';
import { formatMoney, type LedgerEntryResponse, type Words } from '@broodsilk/shared';
import { formatDate } from '@/lib/dates';
import { ShowMore } from '@/components/ui/show-more';
import { useWords } from '@/lib/i18n';
import { sentence } from '@/lib/sentence';
import { useEntries } from '../api/entries';
import { ENTRY_KIND_LABELS, METHOD_LABELS, STATUS_LABELS, midSentence, young } from '../utils/labels';

const rowId = (seq: number) => `account-entry-${seq}`;

function partyText(e: LedgerEntryResponse): string {
  if (e.party) return e.party.name;
  if (e.from && e.to) return `${e.from.name} → ${e.to.name}`;
  return '—';
}

function amountText(t: Words, e: LedgerEntryResponse): string {
  const parts: string[] = [];
  if (e.count !== null) parts.push(young(e.count));
  if (e.kind === 'arrival' && e.arrivedAlive !== null) parts.push(t('page.account.entries.arrived', { alive: e.arrivedAlive, dead: e.arrivedDead ?? 0 }));
  if (e.amountMinor !== null && e.currency) parts.push(formatMoney(e.amountMinor, e.currency));
  if (e.priceMinor !== null && e.currency) parts.push(t('page.account.entries.forPrice', { price: formatMoney(e.priceMinor, e.currency) }));
  if (e.pricePerSpiderlingMinor !== null && e.currency)
    parts.push(t('page.account.entries.each', { price: formatMoney(e.pricePerSpiderlingMinor, e.currency) }));
  return parts.join(' ') || '—';
}

function methodText(t: Words, e: LedgerEntryResponse & { method: NonNullable<LedgerEntryResponse['method']> }): string {
  const method = METHOD_LABELS[e.method];
  if (e.carrier && e.tracking) return t('page.account.entries.withCarrierTracking', { method, carrier: e.carrier, tracking: e.tracking });
  if (e.carrier) return t('page.account.entries.withCarrier', { method, carrier: e.carrier });
  if (e.tracking) return t('page.account.entries.withTracking', { method, tracking: e.tracking });
  return method;
}

function Details({ e, bySeq }: { e: LedgerEntryResponse; bySeq: Map<string, LedgerEntryResponse> }) {
  const t = useWords();
  const lines: ReactNode[] = [];
  if (e.method) lines.push(methodText(t, { ...e, method: e.method }));
  const target = e.reversesId ? bySeq.get(e.reversesId) : e.handOverId ? bySeq.get(e.handOverId) : e.confirmsId ? bySeq.get(e.confirmsId) : undefined;
  if (target) {
    lines.push(
      <>
        {t(e.reversesId ? 'page.account.entries.reverses' : 'page.account.entries.for')}{' '}
        <Anchor href={`#${rowId(target.seq)}`} size="xs">
          {t('page.account.entries.target', { seq: target.seq, kind: midSentence(ENTRY_KIND_LABELS[target.kind]) })}
        </Anchor>
      </>,
    );
  }
  if (e.reason) lines.push(t('page.account.entries.why', { reason: e.reason }));
  if (e.note) lines.push(e.note);
  if (e.problem) lines.push(<span className="tone-failed">{sentence(t, e.problem)}</span>);
  if (!lines.length) return null;
  return (
    <Stack gap={0}>
      {lines.map((l, i) => (
        <Text key={i} size="xs" c="dimmed">
          {l}
        </Text>
      ))}
    </Stack>
  );
}

function EntryState({ e, reverser }: { e: LedgerEntryResponse; reverser?: LedgerEntryResponse }) {
  const t = useWords();
  const status = STATUS_LABELS[e.status];
  return (
    <>
      {e.status !== 'awaiting-confirmation' && (
        <Text size="sm" className={status.tone}>
          {status.label}
        </Text>
      )}
      {e.awaitingConfirmationBy && e.status !== 'reversed' && e.status !== 'left-out' && (
        <Text size="sm" className="tone-due">
          {t(e.kind === 'hand-over' ? 'page.account.entries.waitingReceipt' : 'page.account.entries.waiting', { name: e.awaitingConfirmationBy.name })}
        </Text>
      )}
      {reverser && (
        <Anchor href={`#${rowId(reverser.seq)}`} size="xs">
          {t('page.account.entries.byCorrection', { seq: reverser.seq })}
        </Anchor>
      )}
    </>
  );
}

/** The ledger as recorded: nothing here is editable; a correction is a new entry that reverses an old one. */
export function EntriesTable({ projectId }: { projectId: string }) {
  const entries = useEntries(projectId);
  const t = useWords();
  if (entries.isPending) return <Text c="dimmed">{t('page.account.entries.loading')}</Text>;
  if (entries.isError) return <Alert color="clay">{entries.error.message}</Alert>;
  const list = entries.data;
  if (list.length === 0) return <Text c="dimmed">{t('page.account.entries.none')}</Text>;
  const byId = new Map(list.map((e) => [e.id, e]));
  const reversedBy = new Map<string, LedgerEntryResponse>();
  for (const e of list) if (e.kind === 'correction' && e.reversesId && e.status === 'in-force') reversedBy.set(e.reversesId, e);
  return (
    <>
      <Stack gap="xs" hiddenFrom="sm" component="ol" aria-label={t('page.account.entries.listLabel')} p={0} m={0} style={{ listStyle: 'none' }}>
        {list.map((e) => (
          <Card key={e.id} withBorder padding="xs" component="li" data-testid={`entry-card-${e.kind}`}>
            <Group justify="space-between" gap="xs" wrap="nowrap" align="flex-start">
              <Text size="sm" fw={600}>
                #{e.seq} {ENTRY_KIND_LABELS[e.kind]}
              </Text>
              <Text size="xs" c="dimmed" style={{ whiteSpace: 'nowrap' }}>
                {formatDate(e.date)}
              </Text>
            </Group>
            <Text size="sm">
              {partyText(e)} · {amountText(t, e)}
            </Text>
            <Details e={e} bySeq={byId} />
            <Group justify="space-between" gap="xs" align="flex-end">
              <Stack gap={0}>
                <EntryState e={e} reverser={reversedBy.get(e.id)} />
              </Stack>
              <Text size="xs" c="dimmed">
                {e.source === 'payment-provider' ? t('page.account.entries.paymentProvider') : (e.recordedBy?.name ?? '')}
              </Text>
            </Group>
          </Card>
        ))}
      </Stack>
      <Table.ScrollContainer minWidth={760} visibleFrom="sm">
        <Table aria-label={t('page.account.entries.tableLabel')} verticalSpacing="xs" striped>
          <Table.Thead>
            <Table.Tr>
              <Table.Th>#</Table.Th>
              <Table.Th>{t('page.account.entries.date')}</Table.Th>
              <Table.Th>{t('page.account.entries.kind')}</Table.Th>
              <Table.Th>{t('page.account.party')}</Table.Th>
              <Table.Th>{t('page.account.entries.countAmount')}</Table.Th>
              <Table.Th>{t('page.account.entries.recordedBy')}</Table.Th>
              <Table.Th>{t('page.account.entries.state')}</Table.Th>
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {list.map((e) => {
              const reverser = reversedBy.get(e.id);
              return (
                <Table.Tr key={e.id} id={rowId(e.seq)} data-testid={`entry-${e.kind}`}>
                  <Table.Td>{e.seq}</Table.Td>
                  <Table.Td style={{ whiteSpace: 'nowrap' }}>{formatDate(e.date)}</Table.Td>
                  <Table.Td>
                    {ENTRY_KIND_LABELS[e.kind]}
                    <Details e={e} bySeq={byId} />
                  </Table.Td>
                  <Table.Td>{partyText(e)}</Table.Td>
                  <Table.Td>{amountText(t, e)}</Table.Td>
                  <Table.Td>{e.source === 'payment-provider' ? t('page.account.entries.paymentProvider') : (e.recordedBy?.name ?? '—')}</Table.Td>
                  <Table.Td>
                    <EntryState e={e} reverser={reverser} />
                  </Table.Td>
                </Table.Tr>
              );
            })}
          </Table.Tbody>
        </Table>
      </Table.ScrollContainer>
      <ShowMore
        label={t('page.account.entriesLater')}
        hasMore={entries.hasNextPage}
        loading={entries.isFetchingNextPage}
        onMore={() => void entries.fetchNextPage()}
      />
    </>
  );
}

import { Alert, Badge, Button, Group, Popover, Stack, Table, Text } from '@mantine/core';
import { TextField } from '@/components/fields/text-field';
import { checkText } from '@/components/fields/text-rule';
import { ScrollTable } from '@/components/ui/scroll-table';
import { ShowMore } from '@/components/ui/show-more';
import { useState } from 'react';
import { TEXT_LIMITS, type CareLogEntryResponse, type TemperatureUnit } from '@broodsilk/shared';
import { formatTemperature } from '@/lib/numbers';
import { formatInstant } from '@/lib/dates';
import { isApiError } from '@/lib/api-error';
import { useAddCareLogEntry, useCareLog } from '../api/care-log';
import { bandFlag, broodLabel } from '../utils/sac-view';
import { catalogueLabels, useWords } from '@/lib/i18n';

const KIND_LABELS = catalogueLabels('careLogKind');

function what(e: CareLogEntryResponse, unit: TemperatureUnit): string {
  switch (e.kind) {
    case 'temperature':
      return e.temperatureC !== null ? formatTemperature(e.temperatureC, unit) : '';
    case 'humidity':
      return e.humidityPercent !== null ? `${e.humidityPercent} %` : '';
    case 'stage':
      return e.stage ? broodLabel(e.stage) : '';
    case 'strike':
      return e.text ?? '';
    default:
      return e.text ?? '';
  }
}

function StrikeButton({ sacId, entry }: { sacId: string; entry: CareLogEntryResponse }) {
  const t = useWords();
  const add = useAddCareLogEntry(sacId);
  const [opened, setOpened] = useState(false);
  const [reason, setReason] = useState('');
  const [error, setError] = useState<string | null>(null);
  return (
    <Popover opened={opened} onChange={setOpened} position="bottom-end" withArrow trapFocus>
      <Popover.Target>
        <Button size="compact-xs" variant="subtle" color="clay" onClick={() => setOpened((o) => !o)}>
          {t('page.sacs.careLog.strike')}
        </Button>
      </Popover.Target>
      <Popover.Dropdown>
        <Stack gap="xs" w={260}>
          <TextField
            label={t('page.sacs.careLog.whyWrong')}
            maxLength={TEXT_LIMITS.correctionReason}
            value={reason}
            onChange={(e) => setReason(e.currentTarget.value)}
            error={checkText(reason, { maxLength: TEXT_LIMITS.correctionReason })}
            data-autofocus
          />
          {error && (
            <Text size="xs" className="tone-failed" role="alert">
              {error}
            </Text>
          )}
          <Button
            size="xs"
            color="clay"
            disabled={!reason.trim() || reason.length > TEXT_LIMITS.correctionReason || add.isPending}
            loading={add.isPending}
            onClick={async () => {
              setError(null);
              try {
                await add.mutateAsync({ kind: 'strike', strikes: entry.id, reason: reason.trim(), text: reason.trim() });
                setOpened(false);
              } catch (e) {
                setError(isApiError(e) ? e.message : t('page.sacs.careLog.notSaved'));
              }
            }}
          >
            {t('page.sacs.careLog.strikeEntry')}
          </Button>
        </Stack>
      </Popover.Dropdown>
    </Popover>
  );
}

/** The care log of a sac, newest first; wrong entries stay visible, struck through, with the reason. */
export function CareLogList({
  sacId,
  timeZone,
  temperatureUnit,
  canStrike,
}: {
  sacId: string;
  timeZone: string;
  temperatureUnit: TemperatureUnit;
  canStrike: boolean;
}) {
  const log = useCareLog(sacId);
  const t = useWords();
  if (log.isPending) return <Text c="dimmed">{t('page.sacs.careLog.loading')}</Text>;
  if (log.isError) return <Alert color="clay">{log.error.message}</Alert>;
  // Pages come newest first, each older than the one before (keyset on the server).
  const entries = log.data.pages.flatMap((p) => p.items);
  if (entries.length === 0) return <Text c="dimmed">{t('page.sacs.careLog.none')}</Text>;
  return (
    <>
      <ScrollTable minWidth={360} label={t('page.sacs.page.careLog')}>
        <Table verticalSpacing={4} fz="sm" data-testid="care-log">
          <Table.Thead>
            <Table.Tr>
              <Table.Th>{t('page.sacs.columns.when')}</Table.Th>
              <Table.Th>{t('page.sacs.columns.entry')}</Table.Th>
              <Table.Th visibleFrom="sm">{t('page.sacs.columns.by')}</Table.Th>
              <Table.Th />
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {entries.map((e) => {
              const struck = !!e.struck;
              return (
                <Table.Tr key={e.id} data-struck={struck || undefined}>
                  <Table.Td style={{ textDecoration: struck ? 'line-through' : undefined }}>{formatInstant(e.at, timeZone)}</Table.Td>
                  <Table.Td>
                    <Group gap={6} wrap="nowrap">
                      <Badge size="sm" variant="light" tt="none" color={e.kind === 'strike' ? 'clay' : e.kind === 'roll' ? 'moss' : 'gray'}>
                        {KIND_LABELS[e.kind]}
                      </Badge>
                      <Text size="sm" td={struck ? 'line-through' : undefined} c={struck ? 'dimmed' : undefined}>
                        {what(e, temperatureUnit)}
                      </Text>
                      {bandFlag(e.outsideBand) && (
                        <Badge size="sm" variant="light" color="clay" tt="none" data-testid="outside-band">
                          {bandFlag(e.outsideBand)}
                        </Badge>
                      )}
                    </Group>
                    {e.struck && (
                      <Text size="xs" className="tone-failed">
                        {e.struck.reason ? t('page.sacs.careLog.struckBecause', { reason: e.struck.reason }) : t('page.sacs.careLog.struck')}
                      </Text>
                    )}
                    <Text size="xs" c="dimmed" hiddenFrom="sm">
                      {e.author?.name}
                    </Text>
                  </Table.Td>
                  <Table.Td visibleFrom="sm">{e.author?.name ?? '—'}</Table.Td>
                  <Table.Td>{canStrike && !struck && e.kind !== 'strike' && <StrikeButton sacId={sacId} entry={e} />}</Table.Td>
                </Table.Tr>
              );
            })}
          </Table.Tbody>
        </Table>
      </ScrollTable>
      <ShowMore label={t('page.sacs.careLogOlder')} hasMore={log.hasNextPage} loading={log.isFetchingNextPage} onMore={() => void log.fetchNextPage()} />
    </>
  );
}

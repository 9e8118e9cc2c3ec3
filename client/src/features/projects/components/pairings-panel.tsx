import { Alert, Badge, Button, Collapse, Group, Stack, Table, Text, VisuallyHidden } from '@mantine/core';
import { useState } from 'react';
import { label, type PairingResponse } from '@broodsilk/shared';
import { formatInstant } from '@/lib/dates';
import { useWords } from '@/lib/i18n';
import { usePairings } from '../api/pairings';
import { PAIRING_OUTCOME_LABELS } from '../utils/labels';
import { ScrollTable } from '@/components/ui/scroll-table';
import { PairingForm, type MaleOption } from './pairing-form';

interface PairingsPanelProps {
  projectId: string;
  timeZone: string;
  /** The keeper, while the project is open. */
  canRecord: boolean;
  /** The keeper, also after the end: a correction mends the record of what happened. */
  canCorrect: boolean;
  males: MaleOption[];
}

function PairingRow({ p, timeZone, onCorrect }: { p: PairingResponse; timeZone: string; onCorrect?: () => void }) {
  const t = useWords();
  const struck = !!p.struckBy;
  return (
    <Table.Tr data-testid="pairing-row" data-struck={struck || undefined} style={struck ? { textDecoration: 'line-through' } : undefined}>
      <Table.Td>{formatInstant(p.startedAt, timeZone)}</Table.Td>
      <Table.Td>{p.male.label}</Table.Td>
      <Table.Td visibleFrom="sm">{p.durationMinutes}</Table.Td>
      <Table.Td>
        <Badge
          variant="light"
          tt="none"
          color={p.outcome === 'connected' ? 'moss' : p.outcome === 'interest-only' ? 'gray' : 'clay'}
          styles={{ root: { maxWidth: 'none' }, label: { overflow: 'visible' } }}
        >
          {PAIRING_OUTCOME_LABELS[p.outcome]}
        </Badge>
      </Table.Td>
      <Table.Td>
        <Stack gap={2}>
          {struck && (
            <Badge variant="outline" color="gray" tt="none" style={{ textDecoration: 'none' }}>
              {t('page.projects.pairings.struck')}
            </Badge>
          )}
          {p.corrects && (
            <Text size="xs" c="dimmed">
              {t('page.projects.pairings.correction', { reason: p.reason })}
            </Text>
          )}
          {p.notes && <Text size="sm">{p.notes}</Text>}
        </Stack>
      </Table.Td>
      <Table.Td>
        {onCorrect && !struck && (
          <Button
            size="compact-sm"
            variant="subtle"
            onClick={onCorrect}
            aria-label={t('page.projects.pairings.correctOf', { when: formatInstant(p.startedAt, timeZone) })}
          >
            {t('page.projects.pairings.correct')}
          </Button>
        )}
      </Table.Td>
    </Table.Tr>
  );
}

/** Pairing attempts of a project, corrected ones struck through; for the keeper, forms to record and correct one. */
export function PairingsPanel({ projectId, timeZone, canRecord, canCorrect, males }: PairingsPanelProps) {
  const t = useWords();
  const pairings = usePairings(projectId);
  const [adding, setAdding] = useState(false);
  const [correcting, setCorrecting] = useState<PairingResponse | null>(null);

  return (
    <Stack>
      {pairings.isError && <Alert color="clay">{pairings.error.message}</Alert>}
      {pairings.data && pairings.data.length === 0 && <Text c="dimmed">{t('page.projects.pairings.none')}</Text>}
      {pairings.data && pairings.data.length > 0 && (
        <ScrollTable minWidth={560} label={t('page.projects.pairings.tableLabel')}>
          <Table striped verticalSpacing={4} fz="sm" data-testid="pairings-table">
            <Table.Thead>
              <Table.Tr>
                <Table.Th>{t('page.projects.pairings.started')}</Table.Th>
                <Table.Th>{label(t, 'sex', 'male')}</Table.Th>
                <Table.Th visibleFrom="sm">{t('page.projects.pairings.minutes')}</Table.Th>
                <Table.Th>{t('page.projects.pairings.outcome')}</Table.Th>
                <Table.Th>{t('page.projects.pairings.notes')}</Table.Th>
                <Table.Th>
                  <VisuallyHidden>{t('page.projects.pairings.actions')}</VisuallyHidden>
                </Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {pairings.data.map((p) => (
                <PairingRow
                  key={p.id}
                  p={p}
                  timeZone={timeZone}
                  onCorrect={
                    canCorrect
                      ? () => {
                          setAdding(false);
                          setCorrecting(p);
                        }
                      : undefined
                  }
                />
              ))}
            </Table.Tbody>
          </Table>
        </ScrollTable>
      )}
      {correcting && (
        <PairingForm key={correcting.id} projectId={projectId} timeZone={timeZone} males={males} correcting={correcting} onDone={() => setCorrecting(null)} />
      )}
      {canRecord && !correcting && (
        <>
          <Group>
            <Button variant="light" onClick={() => setAdding((o) => !o)}>
              {t(adding ? 'page.projects.pairings.close' : 'page.projects.pairings.record')}
            </Button>
          </Group>
          <Collapse expanded={adding}>
            <PairingForm projectId={projectId} timeZone={timeZone} males={males} onDone={() => setAdding(false)} />
          </Collapse>
        </>
      )}
    </Stack>
  );
}

import { Anchor, Badge, Group, Table, Text, Tooltip, UnstyledButton } from '@mantine/core';
import { Link } from 'react-router';
import type { AnimalSort, AnimalSummary, MaleClock } from '@broodsilk/shared';
import { formatDate } from '@/lib/dates';
import { useWords } from '@/lib/i18n';
import { CUSTODY_LABELS, MATURITY_LABELS, SEX_LABELS, SEX_SIGNS, STATUS_LABELS } from '../utils/animal-view';
import { ClockBadge } from './clock-badge';

interface AnimalTableProps {
  items: AnimalSummary[];
  sort: AnimalSort;
  order: 'asc' | 'desc';
  onSort: (sort: AnimalSort, order: 'asc' | 'desc') => void;
  hrefOf: (id: string) => string;
  /** Whether filters narrow the list: an empty list then means no match, not an empty collection. */
  filtered: boolean;
  /** Male clocks by animal id (the list itself carries none). */
  clocks?: ReadonlyMap<string, MaleClock>;
  /** Former names by species id, for the hover on the species name. */
  formerNames?: ReadonlyMap<string, string[]>;
}

/** Signs beside a sorted column (hidden from screen readers, which hear aria-sort). */
const ORDER_SIGNS = { asc: '▲', desc: '▼', none: '↕' } as const;

function SortHeader({ label, column, sort, order, onSort }: { label: string; column: AnimalSort } & Pick<AnimalTableProps, 'sort' | 'order' | 'onSort'>) {
  const t = useWords();
  const active = sort === column;
  const next = active && order === 'asc' ? 'desc' : 'asc';
  const sign = ORDER_SIGNS[active ? order : 'none'];
  return (
    <Table.Th aria-sort={active ? (order === 'asc' ? 'ascending' : 'descending') : 'none'}>
      <UnstyledButton
        onClick={() => onSort(column, next)}
        style={{ minHeight: 44, fontWeight: 700, fontSize: 'var(--mantine-font-size-sm)' }}
        aria-label={t(`page.collection.table.sortBy.${column}`)}
      >
        {label} <span aria-hidden>{sign}</span>
      </UnstyledButton>
    </Table.Th>
  );
}

/** The collection as a dense table; on a phone it scrolls sideways rather than squeezing. */
export function AnimalTable({ items, sort, order, onSort, hrefOf, clocks, formerNames, filtered }: AnimalTableProps) {
  const t = useWords();
  const head = { sort, order, onSort };
  return (
    <Table.ScrollContainer minWidth={860}>
      <Table striped highlightOnHover verticalSpacing={4} aria-label={t('page.collection.table.name')}>
        <Table.Thead>
          <Table.Tr>
            <SortHeader label={t('page.collection.table.label')} column="label" {...head} />
            <SortHeader label={t('page.collection.table.species')} column="species" {...head} />
            <SortHeader label={t('page.collection.table.sex')} column="sex" {...head} />
            <SortHeader label={t('page.collection.table.maturity')} column="maturedOn" {...head} />
            <SortHeader label={t('page.collection.table.status')} column="status" {...head} />
            <Table.Th>{t('page.collection.table.custody')}</Table.Th>
            <Table.Th>{t('page.collection.table.enclosure')}</Table.Th>
            <Table.Th>{t('page.collection.table.lastMolt')}</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {items.map((a) => {
            const clock = clocks?.get(a.id);
            const former = formerNames?.get(a.species.id) ?? [];
            return (
              <Table.Tr key={a.id}>
                <Table.Td>
                  <Anchor component={Link} to={hrefOf(a.id)} fw={600} style={{ display: 'inline-block', paddingBlock: 10 }}>
                    {a.label}
                  </Anchor>
                </Table.Td>
                <Table.Td>
                  {former.length > 0 ? (
                    <Tooltip label={t('page.collection.table.formerly', { names: former.join(', ') })} events={{ hover: true, focus: true, touch: true }}>
                      <Text size="sm" fs="italic" tabIndex={0} style={{ textDecoration: 'underline dotted' }}>
                        {a.species.scientificName}
                      </Text>
                    </Tooltip>
                  ) : (
                    <Text size="sm" fs="italic">
                      {a.species.scientificName}
                    </Text>
                  )}
                </Table.Td>
                <Table.Td>
                  <Text size="sm">
                    <span aria-hidden>{SEX_SIGNS[a.sex]} </span>
                    {SEX_LABELS[a.sex]}
                  </Text>
                </Table.Td>
                <Table.Td>
                  {clock ? (
                    <ClockBadge clock={clock} />
                  ) : (
                    <Text size="sm" c={a.maturity === 'mature' ? undefined : 'dimmed'}>
                      {MATURITY_LABELS[a.maturity]}
                    </Text>
                  )}
                </Table.Td>
                <Table.Td>
                  <Text size="sm" className={a.status === 'deceased' ? undefined : a.status === 'active' ? undefined : 'tone-due'}>
                    {a.statusOn && a.status !== 'active'
                      ? t('page.collection.table.statusOn', { status: STATUS_LABELS[a.status], date: a.statusOn })
                      : STATUS_LABELS[a.status]}
                  </Text>
                </Table.Td>
                <Table.Td>
                  {a.heldBy ? (
                    // Hers, kept on another keeper's record: shown from her side, and only that keeper edits it.
                    <Group gap={4} wrap="nowrap" data-testid="held-by">
                      <Badge variant="outline" color="amber" size="sm" style={{ textTransform: 'none' }}>
                        {t('page.collection.table.onLoanTo', { name: a.heldBy.name })}
                      </Badge>
                      <Text size="xs" c="dimmed">
                        {t('page.collection.table.readOnly')}
                      </Text>
                    </Group>
                  ) : a.custody === 'with-owner' ? (
                    <Text size="sm" c="dimmed">
                      {CUSTODY_LABELS[a.custody]}
                    </Text>
                  ) : (
                    <Group gap={4} wrap="nowrap">
                      <Badge variant="outline" color={a.custody === 'loan-in' ? 'amber' : 'gray'} size="sm" style={{ textTransform: 'none' }}>
                        {CUSTODY_LABELS[a.custody]}
                      </Badge>
                      {(a.custodyParty || a.dueBackOn) && (
                        <Text size="xs" c="dimmed">
                          {[a.custodyParty, a.dueBackOn ? t('page.collection.table.backOn', { date: a.dueBackOn }) : null].filter(Boolean).join(' · ')}
                        </Text>
                      )}
                    </Group>
                  )}
                </Table.Td>
                <Table.Td>
                  <Text size="sm">{a.enclosure ?? '—'}</Text>
                </Table.Td>
                <Table.Td>
                  <Text size="sm">{a.lastMoltOn ? formatDate(a.lastMoltOn) : '—'}</Text>
                </Table.Td>
              </Table.Tr>
            );
          })}
        </Table.Tbody>
      </Table>
      {items.length === 0 && (
        <Group justify="center" p="lg">
          <Text c="dimmed">{t(filtered ? 'page.collection.table.noMatch' : 'page.collection.table.empty')}</Text>
        </Group>
      )}
    </Table.ScrollContainer>
  );
}

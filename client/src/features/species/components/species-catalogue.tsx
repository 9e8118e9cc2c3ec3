import { Badge, Card, Group, Select, SimpleGrid, Stack, Text, TextInput } from '@mantine/core';
import { Pager } from '@/components/ui/pager';
import { useDebouncedValue } from '@mantine/hooks';
import { useState } from 'react';
import { SPECIES_GROUPS, type SpeciesGroup, type SpeciesResponse, type Sourced, type ValueOrigin } from '@broodsilk/shared';
import { useWords } from '@/lib/i18n';
import { useSpeciesList } from '../api/species';
import { formatRange, matchedFormerName, sampledRange, useSourceLabel } from '../utils/species-view';

const PAGE = 24;

function Value({ label, text, value }: { label: string; text: string; value: Sourced<unknown> & { from: ValueOrigin } }) {
  const t = useWords();
  const sourceLabel = useSourceLabel();
  const source = `${sourceLabel(value.source)}${value.from !== 'species' ? ` · ${t(`page.species.origin.${value.from}`)}` : ''}`;
  return (
    <div>
      <Group justify="space-between" gap="xs" wrap="nowrap">
        <Text size="sm" c="dimmed">
          {label}
        </Text>
        <Text size="sm" fw={600} style={{ whiteSpace: 'nowrap' }}>
          {text}
        </Text>
      </Group>
      <Text size="xs" c="dimmed" lineClamp={2} title={source}>
        {t('valueSource', { source })}
      </Text>
    </div>
  );
}

function SpeciesCard({ species, query }: { species: SpeciesResponse; query: string }) {
  const t = useWords();
  const e = species.effective;
  const former = matchedFormerName(species, query);
  return (
    <Card withBorder padding="sm" data-testid="species-card">
      <Stack gap={6}>
        <div>
          <Text fw={700} fs="italic">
            {species.scientificName}{' '}
            <Text span size="xs" c="dimmed" fs="normal">
              {species.authority}
            </Text>
          </Text>
          {former && (
            <Text size="xs" c="dimmed">
              {t('page.species.formerly')} <i>{former}</i>
            </Text>
          )}
          {species.commonNames.length > 0 && (
            <Text size="xs" c="dimmed">
              {species.commonNames.join(', ')}
            </Text>
          )}
        </div>
        <Group gap={6}>
          <Badge variant="light" color="moss" size="sm">
            {t(`page.species.group.${species.group}`)}
          </Badge>
          {species.cautions.urticatingHairs.value && (
            <Badge variant="light" color="amber" size="sm">
              {t('page.species.badge.hairs')}
            </Badge>
          )}
          {species.cautions.venom.value === 'medically-significant' && (
            <Badge variant="light" color="clay" size="sm">
              {t('page.species.badge.venom')}
            </Badge>
          )}
          {species.cautions.venom.value === 'not-known' && (
            <Badge variant="light" color="amber" size="sm">
              {t('page.species.badge.venomNotKnown')}
            </Badge>
          )}
          {species.tradeListing.value && (
            <Badge variant="outline" color="gray" size="sm">
              {species.tradeListing.value}
            </Badge>
          )}
        </Group>
        <Value
          label={t('page.species.value.pullWindow')}
          text={t('page.species.value.pullDays', { from: e.pullWindow.value.fromDay, to: e.pullWindow.value.toDay })}
          value={e.pullWindow}
        />
        <Value
          label={t('page.species.value.pairingToSac')}
          text={t('page.species.value.days', { range: formatRange(e.pairingToSacDays.value.min, e.pairingToSacDays.value.max) })}
          value={e.pairingToSacDays}
        />
        <Value label={t('page.species.value.eggsPerSac')} text={sampledRange(t, e.eggsPerSac)} value={e.eggsPerSac} />
        <Value
          label={t('page.species.value.lifespan')}
          text={t('page.species.value.months', { range: formatRange(e.matureMaleLifespanMonths.value.min, e.matureMaleLifespanMonths.value.max) })}
          value={e.matureMaleLifespanMonths}
        />
      </Stack>
    </Card>
  );
}

/** The catalogue: search by current, former or common name, filter by group, page through. */
export function SpeciesCatalogue() {
  const t = useWords();
  const [text, setText] = useState('');
  const [group, setGroup] = useState<SpeciesGroup | null>(null);
  const [page, setPage] = useState(1);
  const [q] = useDebouncedValue(text.trim(), 250);
  const { data, isPending, isError, error } = useSpeciesList({ q: q || undefined, group: group ?? undefined, limit: PAGE, offset: (page - 1) * PAGE });
  const pages = Math.max(1, Math.ceil((data?.total ?? 0) / PAGE));
  return (
    <Stack>
      <Group align="flex-end" wrap="wrap">
        <TextInput
          label={t('page.species.catalogue.search')}
          placeholder={t('page.species.catalogue.searchHint')}
          value={text}
          onChange={(e) => {
            setText(e.currentTarget.value);
            setPage(1);
          }}
          w={{ base: '100%', sm: 320 }}
        />
        <Select
          label={t('page.species.catalogue.group')}
          placeholder={t('page.species.catalogue.allGroups')}
          clearable
          data={SPECIES_GROUPS.map((g) => ({ value: g, label: t(`page.species.group.${g}`) }))}
          value={group}
          onChange={(g) => {
            setGroup(g as SpeciesGroup | null);
            setPage(1);
          }}
          w={{ base: '100%', sm: 260 }}
        />
      </Group>
      {isError && <Text className="tone-failed">{error.message}</Text>}
      {isPending ? (
        <Text c="dimmed">{t('page.species.catalogue.loading')}</Text>
      ) : (
        <>
          <Text size="sm" c="dimmed">
            {t('page.species.catalogue.count', { count: data?.total ?? 0 })}
          </Text>
          <SimpleGrid cols={{ base: 1, sm: 2, lg: 3 }}>
            {data?.items.map((s) => (
              <SpeciesCard key={s.id} species={s} query={q} />
            ))}
          </SimpleGrid>
          {pages > 1 && <Pager total={pages} value={page} onChange={setPage} size="lg" />}
        </>
      )}
    </Stack>
  );
}

import { Box, Button, Group, Select, TextInput } from '@mantine/core';
import { useDebouncedCallback } from '@mantine/hooks';
import type { ReactNode } from 'react';
import { ANIMAL_SEXES, ANIMAL_STATUSES, type AnimalSex, type AnimalStatus } from '@broodsilk/shared';
import { useWords } from '@/lib/i18n';
import { SEX_LABELS, STATUS_LABELS, hasFilters, type CollectionFilters as Filters } from '../utils/animal-view';

interface CollectionFiltersProps {
  filters: Filters;
  onChange: (next: Partial<Filters>) => void;
  /** The species filter, a picker supplied by the app layer. */
  speciesFilter: ReactNode;
}

/** Text, species, sex and status filters; every change starts again at the first page. */
export function CollectionFilters({ filters, onChange, speciesFilter }: CollectionFiltersProps) {
  const t = useWords();
  const setText = useDebouncedCallback((q: string) => onChange({ q: q.trim() || undefined, offset: 0 }), 300);
  const any = hasFilters(filters);
  return (
    <Group align="flex-end" gap="sm" wrap="wrap">
      <TextInput
        label={t('page.collection.filters.search')}
        placeholder={t('page.collection.filters.searchPlaceholder')}
        defaultValue={filters.q ?? ''}
        key={`q-${filters.q ?? ''}`}
        onChange={(e) => setText(e.currentTarget.value)}
        w={{ base: '100%', sm: 240 }}
        size="md"
      />
      <Box w={{ base: '100%', sm: 300 }}>{speciesFilter}</Box>
      <Select
        label={t('page.collection.filters.sex')}
        placeholder={t('page.collection.filters.any')}
        clearable
        data={ANIMAL_SEXES.map((s) => ({ value: s, label: SEX_LABELS[s] }))}
        value={filters.sex ?? null}
        onChange={(v) => onChange({ sex: (v as AnimalSex | null) ?? undefined, offset: 0 })}
        w={{ base: '47%', sm: 140 }}
        size="md"
      />
      <Select
        label={t('page.collection.filters.status')}
        placeholder={t('page.collection.filters.any')}
        clearable
        data={ANIMAL_STATUSES.map((s) => ({ value: s, label: STATUS_LABELS[s] }))}
        value={filters.status ?? null}
        onChange={(v) => onChange({ status: (v as AnimalStatus | null) ?? undefined, offset: 0 })}
        w={{ base: '47%', sm: 180 }}
        size="md"
      />
      {any && (
        <Button variant="subtle" size="md" onClick={() => onChange({ q: undefined, sex: undefined, status: undefined, speciesId: undefined, offset: 0 })}>
          {t('page.collection.filters.clear')}
        </Button>
      )}
    </Group>
  );
}

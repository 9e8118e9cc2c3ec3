import { Group, Select, Stack, Text } from '@mantine/core';
import { useDebouncedValue } from '@mantine/hooks';
import { useMemo, useState } from 'react';
import { useWords } from '@/lib/i18n';
import { useSpeciesList } from '../api/species';
import { matchedFormerName } from '../utils/species-view';

export interface SpeciesPickerProps {
  label?: string;
  /** The species id the form starts with (edit). */
  defaultValue?: string | null;
  /** Its current name, so it shows before any search. */
  defaultName?: string | null;
  onChange?: (speciesId: string | null) => void;
  error?: React.ReactNode;
  withAsterisk?: boolean;
  description?: string;
  size?: 'sm' | 'md';
}

/**
 * Picks a species from the catalogue by its current or a former name. A hit through a former
 * name says so ("formerly Brachypelma vagans"), since keepers still buy and sell under old names.
 */
export function SpeciesPicker({ label, defaultValue = null, defaultName = null, onChange, error, withAsterisk, description, size = 'sm' }: SpeciesPickerProps) {
  const t = useWords();
  const [value, setValue] = useState<string | null>(defaultValue);
  const [picked, setPicked] = useState<{ value: string; label: string } | null>(
    defaultValue && defaultName ? { value: defaultValue, label: defaultName } : null,
  );
  const [search, setSearch] = useState(defaultName ?? '');
  const [debounced] = useDebouncedValue(search.trim(), 250);
  // Searching for the name already chosen would only list that species again.
  const query = debounced && debounced !== picked?.label ? debounced : '';
  const { data, isFetching } = useSpeciesList({ q: query, limit: 20 }, { enabled: query.length >= 2 });

  const hits = useMemo(() => (query.length >= 2 ? (data?.items ?? []) : []), [data, query]);
  const formerly = useMemo(() => new Map(hits.map((s) => [s.id, matchedFormerName(s, query)])), [hits, query]);
  const options = useMemo(() => {
    const list = hits.map((s) => ({ value: s.id, label: s.scientificName }));
    if (picked && !list.some((o) => o.value === picked.value)) list.unshift(picked);
    return list;
  }, [hits, picked]);

  return (
    <Select
      label={label ?? t('page.species.picker.label')}
      description={description}
      withAsterisk={withAsterisk}
      size={size}
      placeholder={t('page.species.picker.placeholder')}
      searchable
      clearable
      data={options}
      value={value}
      searchValue={search}
      onSearchChange={setSearch}
      // The server already matched current, former and common names.
      filter={({ options: all }) => all}
      nothingFoundMessage={
        query.length < 2 ? t('page.species.picker.tooShort') : isFetching ? t('page.species.picker.searching') : t('page.species.picker.nothing')
      }
      onChange={(id, option) => {
        setValue(id);
        setPicked(id ? { value: id, label: option.label } : null);
        onChange?.(id);
      }}
      error={error}
      renderOption={({ option }) => {
        const former = formerly.get(option.value);
        return (
          <Stack gap={0}>
            <Text size="sm" fs="italic">
              {option.label}
            </Text>
            {former && (
              <Group gap={4}>
                <Text size="xs" c="dimmed">
                  {t('page.species.formerly')} <i>{former}</i>
                </Text>
              </Group>
            )}
          </Stack>
        );
      }}
    />
  );
}

import { Anchor, Button, Drawer, Group, Select, Stack, Tabs, Text } from '@mantine/core';
import { Pager } from '@/components/ui/pager';
import { useMediaQuery } from '@mantine/hooks';
import { notifications } from '@mantine/notifications';
import { useQuery, type QueryClient } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { Link, useNavigate, useSearchParams, type LoaderFunctionArgs, type ShouldRevalidateFunctionArgs } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { animalQueries, useAnimals, useMalesByClock } from '@/features/collection/api/animals';
import { AnimalForm } from '@/features/collection/components/animal-form';
import { AnimalTable } from '@/features/collection/components/animal-table';
import { CollectionFilters } from '@/features/collection/components/collection-filters';
import { CsvTools } from '@/features/collection/components/csv-import';
import { MatureMales } from '@/features/collection/components/mature-males';
import { PAGE_SIZES, filtersFromParams, hasFilters, filtersToParams, type CollectionFilters as Filters } from '@/features/collection/utils/animal-view';
import { speciesQueries, useSpecies } from '@/features/species/api/species';
import { SpeciesPicker } from '@/features/species/components/species-picker';
import { preloadPanels } from '../preload';
import { Trans } from 'react-i18next';
import { useWords } from '@/lib/i18n';

/** The whole catalogue is small (tens of species): one request gives every former name. */
const ALL_SPECIES = { limit: 200 } as const;

export const clientLoader =
  (qc: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const filters = filtersFromParams(new URL(request.url).searchParams);
    const panels = preloadPanels(qc.ensureQueryData(animalQueries.males()), qc.ensureQueryData(speciesQueries.list(ALL_SPECIES)));
    await Promise.all([qc.ensureQueryData(animalQueries.list(filters)), panels]);
    return null;
  };

/** Filters live in the search params; the queries follow them without re-running the loader. */
export function shouldRevalidate({ currentUrl, nextUrl, defaultShouldRevalidate }: ShouldRevalidateFunctionArgs) {
  return currentUrl.pathname === nextUrl.pathname ? false : defaultShouldRevalidate;
}

/** The page's description, one catalogue sentence whose word "catalogue" opens the species pages. */
export function CollectionDescription() {
  return <Trans i18nKey="page.collection.description" components={{ species: <Anchor component={Link} to={paths.species.href()} inherit /> }} />;
}

export function Component() {
  const t = useWords();
  const [params, setParams] = useSearchParams();
  const filters = filtersFromParams(params);
  const view = params.get('view') === 'males' ? 'males' : 'all';
  const navigate = useNavigate();
  const phone = useMediaQuery('(max-width: 48em)');
  const [adding, setAdding] = useState(false);

  const animals = useAnimals(filters);
  const males = useMalesByClock();
  const catalogue = useQuery(speciesQueries.list(ALL_SPECIES));
  const chosenSpecies = useSpecies(filters.speciesId);

  const clocks = useMemo(() => new Map((males.data ?? []).map((r) => [r.animal.id, r.clock])), [males.data]);
  const formerNames = useMemo(() => new Map((catalogue.data?.items ?? []).map((s) => [s.id, s.formerNames])), [catalogue.data]);

  const update = (next: Partial<Filters>) => setParams((p) => filtersToParams({ ...filtersFromParams(p), ...next }, p), { replace: true });
  const setView = (v: string | null) =>
    setParams((p) => {
      const n = new URLSearchParams(p);
      if (v === 'males') n.set('view', 'males');
      else n.delete('view');
      return n;
    });

  const total = animals.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / filters.limit));
  const page = Math.floor(filters.offset / filters.limit) + 1;
  const hrefOf = (id: string) => paths.animal.href(id);

  return (
    <Stack>
      <PageHeader
        title={t('page.collection.title')}
        description={<CollectionDescription />}
        actions={
          <Group gap="xs" align="flex-start">
            <Button onClick={() => setAdding(true)} size="md">
              {t('page.collection.addAnimal')}
            </Button>
            <CsvTools />
          </Group>
        }
      />
      <Tabs value={view} onChange={setView} keepMounted={false}>
        <Tabs.List>
          <Tabs.Tab value="all" style={{ minHeight: 44 }}>
            {t('page.collection.tabAll')}
          </Tabs.Tab>
          <Tabs.Tab value="males" style={{ minHeight: 44 }}>
            {males.data?.length ? t('page.collection.tabMalesCount', { count: males.data.length }) : t('page.collection.tabMales')}
          </Tabs.Tab>
        </Tabs.List>
        <Tabs.Panel value="all" pt="md">
          <Stack>
            <CollectionFilters
              filters={filters}
              onChange={update}
              speciesFilter={
                <SpeciesPicker
                  key={`${filters.speciesId ?? 'none'}-${chosenSpecies.data ? 'named' : 'unnamed'}`}
                  label={t('page.species.picker.label')}
                  size="md"
                  defaultValue={filters.speciesId ?? null}
                  defaultName={chosenSpecies.data?.scientificName ?? null}
                  onChange={(id) => update({ speciesId: id ?? undefined, offset: 0 })}
                />
              }
            />
            {animals.isError ? (
              <Text className="tone-failed">{animals.error.message}</Text>
            ) : (
              <AnimalTable
                items={animals.data?.items ?? []}
                sort={filters.sort}
                order={filters.order}
                onSort={(sort, order) => update({ sort, order, offset: 0 })}
                hrefOf={hrefOf}
                clocks={clocks}
                formerNames={formerNames}
                filtered={hasFilters(filters)}
              />
            )}
            <Group justify="space-between" wrap="wrap">
              <Text size="sm" c="dimmed" aria-live="polite">
                {total === 0
                  ? t('page.collection.noAnimals')
                  : t('page.collection.range', { from: filters.offset + 1, to: Math.min(filters.offset + filters.limit, total), total })}
              </Text>
              <Group gap="sm">
                <Select
                  aria-label={t('page.collection.perPage')}
                  data={PAGE_SIZES.map((n) => ({ value: String(n), label: t('page.collection.perPageOption', { count: n }) }))}
                  value={String(filters.limit)}
                  onChange={(v) => update({ limit: Number(v ?? 25), offset: 0 })}
                  allowDeselect={false}
                  w={130}
                  size="md"
                />
                {pages > 1 && (
                  <Pager total={pages} value={page} onChange={(p) => update({ offset: (p - 1) * filters.limit })} size="lg" siblings={phone ? 0 : 1} />
                )}
              </Group>
            </Group>
          </Stack>
        </Tabs.Panel>
        <Tabs.Panel value="males" pt="md">
          <Text size="sm" c="dimmed" mb="sm">
            {t('page.collection.malesIntro')}
          </Text>
          <MatureMales hrefOf={hrefOf} />
        </Tabs.Panel>
      </Tabs>
      <Drawer opened={adding} onClose={() => setAdding(false)} title={t('page.collection.addAnimalTitle')} position="right" size={phone ? '100%' : 'lg'}>
        {adding && (
          <AnimalForm
            renderSpeciesPicker={(p) => <SpeciesPicker {...p} />}
            onCancel={() => setAdding(false)}
            onSaved={(a) => {
              setAdding(false);
              notifications.show({ color: 'moss', message: t('page.collection.added', { label: a.label }) });
              navigate(paths.animal.href(a.id));
            }}
          />
        )}
      </Drawer>
    </Stack>
  );
}

import { Stack } from '@mantine/core';
import { PageHeader } from '@/components/ui/page-header';
import { SpeciesCatalogue } from '@/features/species/components/species-catalogue';
import { useWords } from '@/lib/i18n';

export function Component() {
  const t = useWords();
  return (
    <Stack>
      <PageHeader title={t('page.species.page.title')} description={t('page.species.page.description')} />
      <SpeciesCatalogue />
    </Stack>
  );
}

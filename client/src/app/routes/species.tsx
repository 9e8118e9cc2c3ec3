import { Stack } from '@mantine/core';
import { PageHeader } from '@/components/ui/page-header';
import { SpeciesCatalogue } from '@/features/species/components/species-catalogue';

export function Component() {
  return (
    <Stack>
      <PageHeader
        title="Species"
        description="The catalogue behind every animal and project: names old and new, safety flags, and the breeding values in force with where each comes from."
      />
      <SpeciesCatalogue />
    </Stack>
  );
}

import { Box, Skeleton, Stack, VisuallyHidden } from '@mantine/core';
import { useWords } from '@/lib/i18n';

/** The shape of a page (title, a line, two panels) while its data or code is on the way. */
export function PageSkeleton() {
  const t = useWords();
  return (
    <Box aria-busy="true" data-testid="page-skeleton">
      <VisuallyHidden role="status">{t('page.shell.loadingPage')}</VisuallyHidden>
      <Stack gap="md" aria-hidden="true">
        <Skeleton height={32} width="40%" radius="sm" />
        <Skeleton height={14} width="65%" radius="sm" />
        <Skeleton height={160} radius="md" />
        <Skeleton height={120} radius="md" />
      </Stack>
    </Box>
  );
}

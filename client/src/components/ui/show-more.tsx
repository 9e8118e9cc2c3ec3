import { Button } from '@mantine/core';
import { useWords } from '@/lib/i18n';

/** The "Show more" of a keyset-paged list: shown while there is a next page, busy while it loads. */
export function ShowMore({ label, hasMore, loading, onMore }: { label: string; hasMore: boolean; loading: boolean; onMore: () => void }) {
  const t = useWords();
  if (!hasMore) return null;
  return (
    <Button
      variant="subtle"
      size="xs"
      mt="sm"
      onClick={onMore}
      loading={loading}
      disabled={loading}
      loaderProps={{ 'aria-label': t('page.shell.loadingMore') }}
    >
      {label}
    </Button>
  );
}

import { Pagination, type PaginationProps } from '@mantine/core';
import { useWords } from '@/lib/i18n';

/** Pagination whose arrow buttons have names and whose current page says so to screen readers. */
export function Pager(props: PaginationProps) {
  const t = useWords();
  return (
    <Pagination
      getControlProps={(control) => ({ 'aria-label': t(`page.shell.pager.${control}`) })}
      getItemProps={(page) => ({ 'aria-label': t('page.shell.pager.page', { page }), 'aria-current': page === props.value ? 'page' : undefined })}
      {...props}
    />
  );
}

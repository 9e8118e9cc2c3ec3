import { Pagination, type PaginationProps } from '@mantine/core';

const CONTROL_NAMES = { first: 'First page', previous: 'Previous page', next: 'Next page', last: 'Last page' } as const;

/** Pagination whose arrow buttons have names and whose current page says so to screen readers. */
export function Pager(props: PaginationProps) {
  return (
    <Pagination
      getControlProps={(control) => ({ 'aria-label': CONTROL_NAMES[control] })}
      getItemProps={(page) => ({ 'aria-label': `Page ${page}`, 'aria-current': page === props.value ? 'page' : undefined })}
      {...props}
    />
  );
}

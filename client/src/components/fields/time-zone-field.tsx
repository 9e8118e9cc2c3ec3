import { Select, type SelectProps } from '@mantine/core';
import { useWords } from '@/lib/i18n';

const ZONES = typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : ['UTC'];

/** The browser's own IANA time zone, the starting point for a new account. */
export const browserTimeZone = (): string => Intl.DateTimeFormat().resolvedOptions().timeZone;

/** Picks an IANA time zone by typing part of its name; a zone the list lacks (an alias) is kept as given. */
export function TimeZoneField({ current, ...props }: Omit<SelectProps, 'data' | 'searchable'> & { current: string }) {
  const t = useWords();
  return (
    <Select label={t('page.shell.fields.timeZone')} searchable allowDeselect={false} data={ZONES.includes(current) ? ZONES : [current, ...ZONES]} {...props} />
  );
}

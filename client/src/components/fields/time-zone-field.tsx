import { Select, type SelectProps } from '@mantine/core';

const ZONES = typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : ['UTC'];

/** The browser's own IANA time zone, the starting point for a new account. */
export const browserTimeZone = (): string => Intl.DateTimeFormat().resolvedOptions().timeZone;

/** Picks an IANA time zone by typing part of its name; a zone the list lacks (an alias) is kept as given. */
export function TimeZoneField({ current, ...props }: Omit<SelectProps, 'data' | 'searchable'> & { current: string }) {
  return <Select label="Time zone" searchable allowDeselect={false} data={ZONES.includes(current) ? ZONES : [current, ...ZONES]} {...props} />;
}

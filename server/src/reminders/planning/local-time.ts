import { DateTime } from 'luxon';

/** The instant of `hour`:00 on the calendar `date` in `zone` (luxon, on the IANA tz database). A skipped hour moves forward. */
export function atLocalHour(date: string, hour: number, zone: string): Date {
  return DateTime.fromISO(`${date}T${String(hour).padStart(2, '0')}:00`, { zone }).toJSDate();
}

/**
 * When a reminder planned for `at` may go out: at `at`, or, if `at` falls in the quiet hours
 * [from, to) of the recipient's zone (wrapping past midnight when from > to), at their end.
 */
export function afterQuietHours(at: Date, quiet: { from: number; to: number } | null, zone: string): Date {
  if (!quiet || quiet.from === quiet.to) return at;
  const local = DateTime.fromJSDate(at, { zone });
  const h = local.hour;
  const inside = quiet.from < quiet.to ? h >= quiet.from && h < quiet.to : h >= quiet.from || h < quiet.to;
  if (!inside) return at;
  // The end is the next `to`:00 after `at` (tomorrow's when the stretch began this evening).
  let end = local.set({ hour: quiet.to, minute: 0, second: 0, millisecond: 0 });
  if (end <= local) end = end.plus({ days: 1 });
  return end.toJSDate();
}

import { DateTime } from 'luxon';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { addDays, dayNumber, diffDays, isCalendarDate, todayIn } from './calendar-day.js';

// Reference: luxon (independent date library, IANA zones via Intl) and the ISO 8601 /
// Gregorian calendar rules (leap year: divisible by 4, except centuries not divisible by 400).
describe('calendar days', () => {
  it.each([
    ['2024-01-31', 1, '2024-02-01'], // month end
    ['2024-02-28', 1, '2024-02-29'], // leap day exists in 2024
    ['2024-02-29', 1, '2024-03-01'],
    ['2023-02-28', 1, '2023-03-01'], // 2023 has no Feb 29
    ['2024-12-31', 1, '2025-01-01'], // year end
    ['2025-01-01', -1, '2024-12-31'],
    ['2024-03-30', 1, '2024-03-31'], // EU clocks change overnight; the calendar does not care
    ['2000-02-28', 1, '2000-02-29'], // 2000 is a leap year (divisible by 400)
    ['1900-02-28', 1, '1900-03-01'], // 1900 is not
  ])('%s + %d day(s) = %s', (date, n, expected) => {
    expect(addDays(date, n)).toBe(expected);
    expect(DateTime.fromISO(date, { zone: 'utc' }).plus({ days: n }).toISODate()).toBe(expected);
  });

  it('agrees with luxon for random dates and offsets', () => {
    fc.assert(
      fc.property(fc.date({ min: new Date('1970-01-01'), max: new Date('2100-12-31'), noInvalidDate: true }), fc.integer({ min: -2000, max: 2000 }), (d, n) => {
        const date = d.toISOString().slice(0, 10);
        const expected = DateTime.fromISO(date, { zone: 'utc' }).plus({ days: n }).toISODate()!;
        expect(addDays(date, n)).toBe(expected);
        expect(diffDays(date, expected)).toBe(n);
      }),
      { numRuns: 500 },
    );
  });

  it('counts day N from the lay date as day 0', () => {
    expect(dayNumber('2024-02-10', '2024-02-10')).toBe(0);
    expect(dayNumber('2024-02-10', '2024-03-02')).toBe(21); // Feb 2024 has 29 days: 19 + 2
    expect(dayNumber('2023-02-10', '2023-03-03')).toBe(21); // 18 + 3
    expect(dayNumber('2024-12-20', '2025-01-10')).toBe(21);
    expect(dayNumber('2024-02-10', '2024-02-09')).toBe(-1);
  });

  it('shows two viewers in opposite zones different dates at the same instant', () => {
    // 2026-06-15T10:30Z: Kiritimati (UTC+14) is already at 00:30 on the 16th; Pago Pago (UTC−11) at 23:30 on the 14th.
    const now = new Date('2026-06-15T10:30:00Z');
    expect(todayIn('Pacific/Kiritimati', now)).toBe('2026-06-16');
    expect(todayIn('Pacific/Pago_Pago', now)).toBe('2026-06-14');
    expect(todayIn('UTC', now)).toBe('2026-06-15');
    for (const zone of ['Pacific/Kiritimati', 'Pacific/Pago_Pago', 'Europe/Berlin', 'America/New_York', 'Asia/Kolkata']) {
      expect(todayIn(zone, now)).toBe(DateTime.fromJSDate(now).setZone(zone).toISODate());
    }
    // The same sac is on different day numbers for the two viewers.
    expect(dayNumber('2026-05-26', todayIn('Pacific/Kiritimati', now))).toBe(21);
    expect(dayNumber('2026-05-26', todayIn('Pacific/Pago_Pago', now))).toBe(19);
  });

  it('agrees with luxon on the local date for random instants and zones', () => {
    const zones = ['Pacific/Kiritimati', 'Pacific/Pago_Pago', 'Europe/Berlin', 'America/New_York', 'Australia/Lord_Howe', 'Asia/Kathmandu'];
    fc.assert(
      fc.property(fc.date({ min: new Date('2000-01-01'), max: new Date('2040-01-01'), noInvalidDate: true }), fc.constantFrom(...zones), (now, zone) => {
        expect(todayIn(zone, now)).toBe(DateTime.fromJSDate(now).setZone(zone).toISODate());
      }),
      { numRuns: 500 },
    );
  });

  it('rejects dates that do not exist and unknown zones with readable messages', () => {
    expect(isCalendarDate('2023-02-29')).toBe(false);
    expect(isCalendarDate('2024-02-29')).toBe(true);
    expect(isCalendarDate('2024-2-9')).toBe(false);
    // ISO 8601 counts a year 0000, but PostgreSQL's date type goes from 4713 BC to 1 BC to AD 1 with no year 0.
    expect(isCalendarDate('0000-01-01')).toBe(false);
    expect(() => addDays('2023-02-29', 1)).toThrow(/not a calendar date/);
    expect(() => addDays('2024-01-01', 1.5)).toThrow(/whole number/);
    expect(() => todayIn('Mars/Olympus_Mons', new Date())).toThrow(/time zone/);
  });
});

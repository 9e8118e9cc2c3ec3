import { DateTime } from 'luxon';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { addDays } from './calendar-day.js';
import { CLOSING_DAYS, DEFAULT_PULL_WINDOW, pullWindowDates, pullWindowState, pullWindowView } from './pull-window.js';

// Default window day 21–45 is common practice (docs/trade-facts.md §2: most keepers pull somewhere
// between day 21 and day 45 after laying); dates are checked against luxon (independent date library).
const luxonPlus = (date: string, days: number) => DateTime.fromISO(date, { zone: 'utc' }).plus({ days }).toISODate();

describe('pull window', () => {
  it('uses day 21 to day 45 and a 3-day closing stretch by default', () => {
    expect(DEFAULT_PULL_WINDOW).toEqual({ fromDay: 21, toDay: 45 });
    expect(CLOSING_DAYS).toBe(3);
  });

  it('dates a window that spans the leap day 2024-02-29', () => {
    // Lay 2024-02-01: day 21 = Feb 22, day 45 = Feb 1 + 45 = Mar 17 (Feb 2024 has 29 days).
    expect(pullWindowDates('2024-02-01')).toEqual({ opensOn: '2024-02-22', closesOn: '2024-03-17', closingFrom: '2024-03-15' });
    // Same lay date in 2023 (no leap day): Mar 18.
    expect(pullWindowDates('2023-02-01').closesOn).toBe('2023-03-18');
  });

  it('dates a window across the year end', () => {
    expect(pullWindowDates('2025-12-01')).toEqual({ opensOn: '2025-12-22', closesOn: '2026-01-15', closingFrom: '2026-01-13' });
  });

  it('agrees with luxon for random lay dates and windows', () => {
    fc.assert(
      fc.property(
        fc.date({ min: new Date('2000-01-01'), max: new Date('2060-01-01'), noInvalidDate: true }),
        fc.integer({ min: 0, max: 120 }),
        fc.integer({ min: 0, max: 60 }),
        (d, fromDay, length) => {
          const lay = d.toISOString().slice(0, 10);
          const window = { fromDay, toDay: fromDay + length };
          const dates = pullWindowDates(lay, window);
          expect(dates.opensOn).toBe(luxonPlus(lay, fromDay));
          expect(dates.closesOn).toBe(luxonPlus(lay, fromDay + length));
          expect(dates.closingFrom).toBe(luxonPlus(lay, Math.max(fromDay, fromDay + length - 2)));
        },
      ),
      { numRuns: 300 },
    );
  });

  it.each([
    [20, 'not-yet'],
    [21, 'open'],
    [42, 'open'],
    [43, 'closing'],
    [45, 'closing'],
    [46, 'past'],
  ] as const)('on day %d the default window is %s', (day, state) => {
    const lay = '2024-12-20';
    expect(pullWindowState(lay, addDays(lay, day))).toBe(state);
  });

  it('treats a window shorter than the closing stretch as closing throughout', () => {
    const w = { fromDay: 30, toDay: 31 };
    expect(pullWindowState('2024-01-01', '2024-01-30', w)).toBe('not-yet');
    expect(pullWindowState('2024-01-01', '2024-01-31', w)).toBe('closing');
    expect(pullWindowState('2024-01-01', '2024-02-01', w)).toBe('closing');
    expect(pullWindowState('2024-01-01', '2024-02-02', w)).toBe('past');
  });

  it('gives a screen the day number, state and days to go', () => {
    expect(pullWindowView('2024-02-01', '2024-02-15')).toEqual({
      opensOn: '2024-02-22',
      closesOn: '2024-03-17',
      closingFrom: '2024-03-15',
      dayNumber: 14,
      state: 'not-yet',
      daysUntilOpens: 7,
      daysUntilCloses: 31,
      daysPastClose: 0,
    });
    expect(pullWindowView('2024-02-01', '2024-03-17')).toMatchObject({ dayNumber: 45, state: 'closing', daysUntilOpens: 0, daysUntilCloses: 0 });
    expect(pullWindowView('2024-02-01', '2024-03-20')).toMatchObject({ dayNumber: 48, state: 'past', daysUntilCloses: null, daysPastClose: 3 });
  });

  it('rejects unusable windows with readable messages', () => {
    expect(() => pullWindowDates('2024-01-01', { fromDay: -1, toDay: 10 })).toThrow(/before the lay date/);
    expect(() => pullWindowState('2024-01-01', '2024-01-05', { fromDay: 30, toDay: 20 })).toThrow(/close on or after/);
    expect(() => pullWindowView('2024-01-01', '2024-01-05', { fromDay: 2.5, toDay: 20 })).toThrow(/whole numbers/);
    expect(() => pullWindowDates('2024-13-01')).toThrow(RangeError);
  });
});

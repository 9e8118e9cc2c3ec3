import { DateTime } from 'luxon';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { GROUP_LIFESPAN_DEFAULTS, maleClock, maleClockUrgency, type MaleLifespan } from './male-clock.js';

// Month arithmetic is checked against luxon (independent library; it also clamps to the month's
// last day). Group defaults: docs/trade-facts.md §5, from memory. Fresh = days 0–20: common practice.
const lux = (d: string) => DateTime.fromISO(d, { zone: 'utc' });
const plusMonths = (d: string, months: number) => lux(d).plus({ months }).toISODate()!;
const plusDays = (d: string, days: number) => lux(d).plus({ days }).toISODate()!;

const nwt: MaleLifespan = GROUP_LIFESPAN_DEFAULTS['nw-terrestrial'];

describe('male clock', () => {
  it('holds the group defaults (from memory, docs/trade-facts.md §5)', () => {
    expect(GROUP_LIFESPAN_DEFAULTS).toEqual({
      'nw-terrestrial': { minMonths: 12, maxMonths: 24 },
      'nw-arboreal': { minMonths: 6, maxMonths: 12 },
      'ow-terrestrial': { minMonths: 4, maxMonths: 12 },
      'ow-arboreal': { minMonths: 4, maxMonths: 12 },
      fossorial: { minMonths: 6, maxMonths: 12 },
    });
  });

  it('is fresh through day 20 and prime from day 21', () => {
    const m = '2025-05-10';
    expect(maleClock(m, m, nwt)).toMatchObject({ daysSinceMaturing: 0, state: 'fresh', nextChange: { state: 'prime', on: '2025-05-31' } });
    expect(maleClock(m, '2025-05-30', nwt)).toMatchObject({ daysSinceMaturing: 20, state: 'fresh' });
    expect(maleClock(m, '2025-05-31', nwt)).toMatchObject({ daysSinceMaturing: 21, state: 'prime', nextChange: { state: 'late', on: '2026-05-10' } });
  });

  it('turns late on exactly maturedOn + minMonths and past typical the day after maturedOn + maxMonths', () => {
    const m = '2025-05-10';
    expect(maleClock(m, '2026-05-09', nwt).state).toBe('prime');
    expect(maleClock(m, '2026-05-10', nwt).state).toBe('late');
    expect(maleClock(m, '2027-05-10', nwt)).toMatchObject({ state: 'late', nextChange: { state: 'past-typical', on: '2027-05-11' }, daysUntilPastTypical: 1 });
    const past = maleClock(m, '2027-05-11', nwt);
    expect(past.state).toBe('past-typical');
    expect(past.nextChange).toBeUndefined();
    expect(past.daysUntilPastTypical).toBe(0);
  });

  it('clamps a Jan 31 maturing date to the end of February, like luxon', () => {
    const oneMonth = { minMonths: 1, maxMonths: 13 };
    const c2024 = maleClock('2024-01-31', '2024-02-15', oneMonth);
    expect(c2024.changes).toEqual([
      { state: 'fresh', from: '2024-01-31' },
      { state: 'prime', from: '2024-02-21' },
      { state: 'late', from: '2024-02-29' },
      { state: 'past-typical', from: '2025-03-01' }, // Jan 31 2024 + 13 months = Feb 28 2025, +1 day
    ]);
    expect(c2024.changes[2]!.from).toBe(plusMonths('2024-01-31', 1));
    expect(maleClock('2023-01-31', '2023-02-27', oneMonth).state).toBe('prime');
    expect(maleClock('2023-01-31', '2023-02-28', oneMonth).state).toBe('late');
  });

  it('handles a male that matured on a leap day', () => {
    const c = maleClock('2024-02-29', '2025-02-28', { minMonths: 12, maxMonths: 48 });
    expect(c.state).toBe('late'); // 2024-02-29 + 12 months = 2025-02-28
    expect(c.changes[2]!.from).toBe(plusMonths('2024-02-29', 12));
    expect(c.changes[3]!.from).toBe('2028-03-01'); // + 48 months = 2028-02-29, then the day after
    expect(c.daysSinceMaturing).toBe(365);
  });

  it('agrees with luxon for random maturing dates, days and lifespans', () => {
    fc.assert(
      fc.property(
        fc.date({ min: new Date('2000-01-01'), max: new Date('2040-01-01'), noInvalidDate: true }),
        fc.integer({ min: 0, max: 1200 }),
        fc.integer({ min: 1, max: 30 }),
        fc.integer({ min: 0, max: 30 }),
        (d, after, minMonths, extra) => {
          const m = d.toISOString().slice(0, 10);
          const today = plusDays(m, after);
          const lifespan = { minMonths, maxMonths: minMonths + extra };
          const lateFrom = plusMonths(m, minMonths);
          const pastFrom = plusDays(plusMonths(m, lifespan.maxMonths), 1);
          const expected = today >= pastFrom ? 'past-typical' : today >= lateFrom ? 'late' : after >= 21 ? 'prime' : 'fresh';
          const clock = maleClock(m, today, lifespan);
          expect(clock.state).toBe(expected);
          expect(clock.daysSinceMaturing).toBe(after);
          expect(clock.daysUntilPastTypical).toBe(lux(pastFrom).diff(lux(today), 'days').days);
        },
      ),
      { numRuns: 500 },
    );
  });

  it('sorts the most urgent male first', () => {
    const today = '2026-06-01';
    const males = [
      { id: 'fresh', clock: maleClock('2026-05-25', today, nwt) },
      { id: 'past', clock: maleClock('2023-01-01', today, nwt) },
      { id: 'late-arboreal', clock: maleClock('2025-09-01', today, GROUP_LIFESPAN_DEFAULTS['nw-arboreal']) },
      { id: 'prime', clock: maleClock('2025-12-01', today, nwt) },
    ];
    const sorted = [...males].sort((a, b) => maleClockUrgency(a.clock) - maleClockUrgency(b.clock)).map((m) => m.id);
    expect(sorted).toEqual(['past', 'late-arboreal', 'prime', 'fresh']);
  });

  it('rejects bad input with readable messages', () => {
    expect(() => maleClock('2026-06-02', '2026-06-01', nwt)).toThrow(/after today/);
    expect(() => maleClock('2026-01-01', '2026-06-01', { minMonths: 12, maxMonths: 6 })).toThrow(/cannot be shorter/);
    expect(() => maleClock('2026-01-01', '2026-06-01', { minMonths: 0, maxMonths: 6 })).toThrow(/at least 1 month/);
    expect(() => maleClock('2026-02-30', '2026-06-01', nwt)).toThrow(/maturing date/);
  });
});

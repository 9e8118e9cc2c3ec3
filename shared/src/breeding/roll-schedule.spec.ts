import { DateTime } from 'luxon';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEFAULT_ROLL_INTERVAL_HOURS, nextRollDue, rollingApplies, rollState, rollStatus } from './roll-schedule.js';

// Interval 12 h: common practice (docs/trade-facts.md §4, from memory). Local times across daylight-saving
// changes are checked against luxon (independent library reading the IANA tz database via Intl);
// the change dates are the EU rule (last Sunday of March/October) and the US rule (second Sunday
// of March, first Sunday of November).
const local = (iso: string, zone: string) => DateTime.fromISO(iso, { zone });

describe('next roll due', () => {
  it('is due at the pull when nothing has been rolled yet', () => {
    expect(nextRollDue({ pulledAt: '2026-04-01T08:00:00Z' }).toISOString()).toBe('2026-04-01T08:00:00.000Z');
    expect(nextRollDue({ pulledAt: '2026-04-01T08:00:00Z', lastRollAt: null }).toISOString()).toBe('2026-04-01T08:00:00.000Z');
  });

  it('defaults to 12 hours', () => {
    expect(DEFAULT_ROLL_INTERVAL_HOURS).toBe(12);
    expect(nextRollDue({ pulledAt: '2026-04-01T08:00:00Z', lastRollAt: '2026-04-01T08:10:00Z' }).toISOString()).toBe('2026-04-01T20:10:00.000Z');
  });

  it.each([
    ['Europe/Berlin', '2026-03-28T20:00', 9, 'spring forward'],
    ['Europe/Berlin', '2026-10-24T20:00', 7, 'fall back'],
    ['America/New_York', '2026-03-07T20:00', 9, 'spring forward'],
    ['America/New_York', '2026-10-31T20:00', 7, 'fall back'],
  ])('in %s a roll at %s local is next due 12 elapsed hours later, at %d:00 local (%s)', (zone, rolledLocal, hour) => {
    const rolled = local(rolledLocal, zone);
    const due = nextRollDue({ pulledAt: rolled.minus({ days: 3 }).toJSDate(), lastRollAt: rolled.toJSDate() });
    const dueLocal = DateTime.fromJSDate(due).setZone(zone);
    expect(dueLocal.hour).toBe(hour);
    expect(dueLocal.minute).toBe(0);
    expect(dueLocal.toISODate()).toBe(rolled.plus({ days: 1 }).toISODate());
    expect(due.getTime()).toBe(rolled.plus({ hours: 12 }).toMillis());
    // A wall-clock schedule would say 08:00 local; 12 elapsed hours do not.
    expect(rolled.plus({ days: 1 }).minus({ hours: 12 }).hour).toBe(8);
    expect(dueLocal.hour).not.toBe(8);
  });

  it('agrees with luxon elapsed-hour arithmetic for random instants and intervals', () => {
    fc.assert(
      fc.property(
        fc.date({ min: new Date('2000-01-01'), max: new Date('2040-01-01'), noInvalidDate: true }),
        fc.integer({ min: 0, max: 100_000_000 }),
        fc.integer({ min: 1, max: 48 }),
        (pulled, after, hours) => {
          const last = new Date(pulled.getTime() + after);
          const due = nextRollDue({ pulledAt: pulled, lastRollAt: last.toISOString(), intervalHours: hours });
          expect(due.getTime()).toBe(DateTime.fromJSDate(last).plus({ hours }).toMillis());
        },
      ),
      { numRuns: 300 },
    );
  });

  it('rejects a last roll before the pull and bad intervals', () => {
    expect(() => nextRollDue({ pulledAt: '2026-04-01T08:00:00Z', lastRollAt: '2026-04-01T07:00:00Z' })).toThrow(/before the sac was pulled/);
    expect(() => nextRollDue({ pulledAt: '2026-04-01T08:00:00Z', intervalHours: 0 })).toThrow(/positive number of hours/);
    expect(() => nextRollDue({ pulledAt: 'yesterday' })).toThrow(/not a valid date/);
  });
});

describe('roll status', () => {
  const due = '2026-04-01T20:00:00Z';
  it.each([
    ['2026-04-01T18:59:59Z', 'upcoming'],
    ['2026-04-01T19:00:00Z', 'due-soon'],
    ['2026-04-01T19:59:59Z', 'due-soon'],
    ['2026-04-01T20:00:00Z', 'due'],
    ['2026-04-01T23:00:00Z', 'due'], // exactly a quarter of 12 h late
    ['2026-04-01T23:00:01Z', 'overdue'],
  ] as const)('at %s a roll due at 20:00Z is %s', (now, status) => {
    expect(rollStatus(now, due)).toBe(status);
  });

  it('scales the overdue limit with the interval', () => {
    expect(rollStatus('2026-04-02T02:00:00Z', due, 24)).toBe('due'); // 6 h = 24/4
    expect(rollStatus('2026-04-02T02:00:01Z', due, 24)).toBe('overdue');
  });
});

describe('rolling applies', () => {
  // docs/trade-facts.md §4: rolled about every 12 hours "until the legs have formed, then left alone" (from memory).
  it('applies to a pulled sac until the legs have formed, by default', () => {
    expect(rollingApplies({ pulled: true })).toBe(true);
    expect(rollingApplies({ pulled: true, stage: 'eggs' })).toBe(true);
    expect(rollingApplies({ pulled: true, stage: 'eggs-with-legs' })).toBe(false);
    expect(rollingApplies({ pulled: true, stage: 'first-instar' })).toBe(false);
  });

  it('keeps applying until first instar when the keeper chooses to keep rolling, or until turned off', () => {
    expect(rollingApplies({ pulled: true, stage: 'eggs-with-legs', rollPastLegs: true })).toBe(true);
    expect(rollingApplies({ pulled: true, stage: 'first-instar', rollPastLegs: true })).toBe(false);
    expect(rollingApplies({ pulled: true, stage: 'second-instar' })).toBe(false);
    expect(rollingApplies({ pulled: true, stage: 'eggs', rollingOff: true })).toBe(false);
  });

  it('never applies to a sac left with the mother', () => {
    expect(rollingApplies({ pulled: false, stage: 'eggs' })).toBe(false);
  });

  it('gives a dashboard the next roll and its status, or nothing', () => {
    const facts = { pulled: true, pulledAt: '2026-04-01T08:00:00Z', lastRollAt: '2026-04-01T08:00:00Z' };
    expect(rollState({ ...facts, now: '2026-04-01T23:30:00Z' })).toEqual({ due: new Date('2026-04-01T20:00:00Z'), status: 'overdue' });
    expect(rollState({ ...facts, stage: 'first-instar', now: '2026-04-01T23:30:00Z' })).toBeNull();
  });
});

import { describe, expect, it } from 'vitest';
import { PENULTIMATE_INTERVAL_MONTHS, maturingWindow } from './maturing-window.js';

// The interval (3–8 months from the last molt) is from memory; month arithmetic follows dayjs
// (a general-purpose date library): 2026-01-31 + 1 month is 2026-02-28. Dates are invented.
describe('maturing window of a penultimate male', () => {
  it('counts the window from his last molt (from memory: 3 to 8 months)', () => {
    expect(PENULTIMATE_INTERVAL_MONTHS).toEqual({ min: 3, max: 8 });
    expect(maturingWindow('2026-02-10', '2026-03-01')).toEqual({
      lastMoltOn: '2026-02-10',
      from: '2026-05-10',
      to: '2026-10-10',
      state: 'not-yet',
      source: 'from memory',
    });
  });

  it('is due from the first to the last day of the window, both included', () => {
    expect(maturingWindow('2026-02-10', '2026-05-09').state).toBe('not-yet');
    expect(maturingWindow('2026-02-10', '2026-05-10').state).toBe('due');
    expect(maturingWindow('2026-02-10', '2026-10-10').state).toBe('due');
    expect(maturingWindow('2026-02-10', '2026-10-11').state).toBe('overdue');
  });

  it('ends a month early at the end of a shorter month (dayjs month arithmetic)', () => {
    expect(maturingWindow('2025-11-30', '2026-01-01', { min: 3, max: 3 })).toMatchObject({ from: '2026-02-28', to: '2026-02-28' });
  });

  it('refuses a date that is not YYYY-MM-DD', () => {
    expect(() => maturingWindow('10.02.2026', '2026-03-01')).toThrow(RangeError);
  });
});

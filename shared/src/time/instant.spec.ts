import { describe, expect, it } from 'vitest';
import { isInstant } from './instant.js';

describe('isInstant', () => {
  it.each([
    ['2026-03-08T07:30:00Z', 'RFC 3339 §5.8 example form with Z'],
    ['1985-04-12T23:20:50.52Z', 'RFC 3339 §5.8 first example'],
    ['1996-12-19T16:39:57-08:00', 'RFC 3339 §5.8 second example'],
    ['2024-02-29T23:30+05:30', 'a leap day (2024 is divisible by 4, not by 100); seconds left out (ISO 8601 reduced precision)'],
    ['2026-03-08t07:30:00z', 'RFC 3339 §5.6 NOTE: T and Z may be lower case'],
  ])('accepts %s (%s)', (value) => {
    expect(isInstant(value)).toBe(true);
  });

  it.each([
    ['2026-02-30T00:00Z', 'no 30 February (RFC 3339 §5.7)'],
    ['2023-02-29T00:00Z', '2023 is no leap year (RFC 3339 Appendix C)'],
    ['2026-03-01T24:00Z', 'time-hour is 00-23 (RFC 3339 §5.6)'],
    ['2026-03-01T10:60Z', 'time-minute is 00-59'],
    ['1990-12-31T23:59:60Z', 'a leap second (RFC 3339 §5.7 allows it; a JavaScript Date cannot hold it)'],
    ['2026-03-01T10:00+24:00', 'offset hours are 00-23'],
    ['2026-03-01T10:00:00', 'no offset: a local time, not an instant'],
    ['2026-03-01 10:00:00Z', 'RFC 3339 allows a space only by mutual agreement; the API takes T'],
    ['0000-01-01T00:00:00Z', 'year 0 (PostgreSQL counts 1 BC, no year 0)'],
    ['2026-03-01', 'a date is not an instant'],
    [20260301, 'not a string'],
  ])('refuses %s (%s)', (value) => {
    expect(isInstant(value)).toBe(false);
  });
});

import { describe, expect, it } from 'vitest';
import { jsonDepthExceeds } from './json-depth';

const bytes = (s: string) => Buffer.from(s, 'utf8');

describe('jsonDepthExceeds', () => {
  it('counts objects and arrays alike (RFC 8259 §2: both are structured values)', () => {
    expect(jsonDepthExceeds(bytes('{"a":[{"b":[1]}]}'), 4)).toBe(false);
    expect(jsonDepthExceeds(bytes('{"a":[{"b":[1]}]}'), 3)).toBe(true);
  });

  it('does not count brackets inside strings, escaped quotes included (RFC 8259 §7)', () => {
    expect(jsonDepthExceeds(bytes('{"a":"[[[[{{{{\\"[[[["}'), 1)).toBe(false);
  });

  it('measures depth, not the number of siblings', () => {
    expect(jsonDepthExceeds(bytes(`[${'[],'.repeat(1000)}[]]`), 2)).toBe(false);
  });
});

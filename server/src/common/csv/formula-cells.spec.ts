import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { neutraliseCell, restoreCell } from './formula-cells';

describe('formula cells (OWASP CSV Injection: prefix = + - @ tab CR with an apostrophe)', () => {
  it.each([
    ['=HYPERLINK("http://x.test","click")', `'=HYPERLINK("http://x.test","click")`],
    ['+1+2', "'+1+2"],
    ['-2+3', "'-2+3"],
    ['@SUM(A1:A2)', "'@SUM(A1:A2)"],
    ['\tcmd', "'\tcmd"],
    ['\rcmd', "'\rcmd"],
    ["'=already", "''=already"],
  ])('neutralises %j', (value, written) => {
    expect(neutraliseCell(value)).toBe(written);
  });

  it.each(['-12.50', '+3', '-1e3', '42', 'Rosie', "O'Brien", "'quoted", ''])('leaves %j as it is (plain numbers and plain text)', (value) => {
    expect(neutraliseCell(value)).toBe(value);
  });

  it('restores exactly what it neutralised, for any text (fixed seed)', () => {
    const text = fc.string({ unit: fc.constantFrom('=', '+', '-', '@', '\t', '\r', "'", '1', '.', 'a', 'e'), maxLength: 8 });
    fc.assert(
      fc.property(text, (v) => restoreCell(neutraliseCell(v)) === v),
      { seed: 4242, numRuns: 2000 },
    );
  });

  it('a written cell never starts a formula', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 12 }), (v) => {
        const w = neutraliseCell(v);
        return !/^[=+\-@\t\r]/.test(w) || /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/.test(w);
      }),
      { seed: 4242, numRuns: 2000 },
    );
  });
});

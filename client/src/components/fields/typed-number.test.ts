import { describe, expect, it } from 'vitest';
import { checkNumber, readTypedNumber } from './typed-number';

describe('readTypedNumber', () => {
  it('reads plain decimal numbers as JavaScript Number() does (ECMA-262 StringToNumber)', () => {
    for (const text of ['0', '12.5', '-40', '900', '.5']) expect(readTypedNumber(text, '.')).toEqual({ kind: 'number', value: Number(text) });
  });

  it('takes a decimal comma only where the locale writes decimals with one', () => {
    expect(readTypedNumber('12,5', ',')).toEqual({ kind: 'number', value: 12.5 });
    expect(readTypedNumber('1,500', '.')).toMatchObject({ kind: 'invalid', message: expect.stringContaining('without a comma') });
  });

  it('asks instead of guessing where a point could group thousands (German writes 1.250 for 1250, Intl.NumberFormat de-DE)', () => {
    expect(new Intl.NumberFormat('de-DE').format(1250)).toBe('1.250');
    expect(readTypedNumber('1.250', ',')).toMatchObject({ kind: 'invalid', message: expect.stringContaining('thousands point') });
    expect(readTypedNumber('26.5', ',')).toEqual({ kind: 'number', value: 26.5 });
    expect(readTypedNumber('1.250', '.')).toEqual({ kind: 'number', value: 1.25 });
  });

  it('refuses what is not a number instead of dropping characters', () => {
    expect(readTypedNumber('12 cm', '.')).toMatchObject({ kind: 'invalid' });
    expect(readTypedNumber('1e3', '.')).toMatchObject({ kind: 'invalid' });
  });
});

describe('checkNumber', () => {
  it('refuses out-of-range values with a message instead of clamping them', () => {
    expect(checkNumber('900', { min: 0.1, max: 40 }, '.')).toBe('900 is out of range: give a number from 0.1 to 40.');
    expect(checkNumber('150', { min: 0, max: 100 }, '.')).toBe('150 is out of range: give a number from 0 to 100.');
    expect(checkNumber('-40', { min: 0 }, '.')).toBe('-40 is out of range: give a number of at least 0.');
  });

  it('refuses extra decimals instead of rounding them away', () => {
    expect(checkNumber('12.25', { decimals: 1 }, '.')).toBe('Give at most 1 decimal place.');
    expect(checkNumber('3.5', { decimals: 0 }, '.')).toBe('Give a whole number.');
    expect(checkNumber('12.5', { min: 0.1, max: 40, decimals: 1 }, '.')).toBeNull();
  });

  it('asks for a required number', () => {
    expect(checkNumber('', { required: 'How many?' }, '.')).toBe('How many?');
    expect(checkNumber('', {}, '.')).toBeNull();
  });
});

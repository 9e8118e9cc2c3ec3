import { describe, expect, it } from 'vitest';
import { formatMinor, minorDigits } from './money-format';

// ISO 4217 "minor unit" column (values from memory of the published list): EUR 2, USD 2, JPY 0, BHD 3.
describe('money format', () => {
  it('uses the ISO 4217 minor unit of each currency', () => {
    expect([minorDigits('EUR'), minorDigits('USD'), minorDigits('JPY'), minorDigits('BHD')]).toEqual([2, 2, 0, 3]);
  });
  it('writes minor units as the amount', () => {
    expect(formatMinor(1450, 'EUR')).toBe('EUR 14.50');
    expect(formatMinor(-5, 'EUR')).toBe('EUR -0.05');
    expect(formatMinor(1450, 'JPY')).toBe('JPY 1450');
    expect(formatMinor(1450, 'BHD')).toBe('BHD 1.450');
  });
});

import { describe, expect, it } from 'vitest';
import { celsiusToFahrenheit, fahrenheitToCelsius, formatTemperature } from './temperature.js';

// Check values: the shipping limits quoted by live-animal dealers (jrsinverts.com: 25–90 °F;
// fanghubtarantulas.com: 40–80 °F) and their Celsius equivalents, as listed in docs/trade-facts.md §9.
describe('temperature conversion', () => {
  it.each([
    [25, -3.89],
    [90, 32.22],
    [40, 4.44],
    [80, 26.67],
  ])('%d °F is %d °C', (f, c) => {
    expect(fahrenheitToCelsius(f)).toBeCloseTo(c, 2);
  });

  it('water freezes at 32 °F and boils at 212 °F (SI Brochure, definition of the Celsius scale)', () => {
    expect(celsiusToFahrenheit(0)).toBe(32);
    expect(celsiusToFahrenheit(100)).toBe(212);
  });

  it('formats in the viewer unit', () => {
    expect(formatTemperature(26, 'C')).toBe('26.0 °C');
    expect(formatTemperature(26, 'F')).toBe('78.8 °F');
  });
});

import type { TemperatureUnit } from '../auth/auth.types.js';

/** Exact conversions (°F = °C × 9/5 + 32); temperatures are stored in °C. */
export function celsiusToFahrenheit(c: number): number {
  return (c * 9) / 5 + 32;
}

export function fahrenheitToCelsius(f: number): number {
  return ((f - 32) * 5) / 9;
}

/** Formats a stored °C value in the viewer's unit, one decimal. */
export function formatTemperature(celsius: number, unit: TemperatureUnit): string {
  const value = unit === 'F' ? celsiusToFahrenheit(celsius) : celsius;
  return `${value.toFixed(1)} °${unit}`;
}

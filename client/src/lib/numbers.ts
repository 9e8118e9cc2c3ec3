import i18next from 'i18next';
import { celsiusToFahrenheit, type TemperatureUnit } from '@broodsilk/shared';

/** The reader's locale for numbers: the interface language (German writes a decimal comma). */
export const numberLocale = (): string => (i18next.language === 'de' ? 'de-DE' : 'en-GB');

/** A number in the reader's language; `decimals` fixes the places shown, else up to 20 as given. */
export function formatNumber(value: number, decimals?: number): string {
  const options: Intl.NumberFormatOptions =
    decimals === undefined ? { maximumFractionDigits: 20 } : { minimumFractionDigits: decimals, maximumFractionDigits: decimals };
  return new Intl.NumberFormat(numberLocale(), options).format(value);
}

/** A stored °C value in the reader's unit and language, one decimal: "26.5 °C", "26,5 °C", "79.7 °F". */
export function formatTemperature(celsius: number, unit: TemperatureUnit): string {
  return `${formatNumber(unit === 'F' ? celsiusToFahrenheit(celsius) : celsius, 1)} °${unit}`;
}

/** A relative humidity in percent in the reader's language: "78 %", "78,5 %". */
export function formatPercent(value: number): string {
  return `${formatNumber(value)} %`;
}

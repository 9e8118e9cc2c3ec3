import type { BandSide, IncubationBand, Range, TemperatureUnit } from '@broodsilk/shared';
import { words } from './i18n';
import { formatPercent, formatTemperature } from './numbers';

/** "24.0 °C to 28.0 °C" in the reader's unit and language, or "70 to 85 %". */
export function rangeText(kind: 'temperature' | 'humidity', range: Range, unit: TemperatureUnit): string {
  return kind === 'temperature'
    ? words('page.sacs.band.range', { min: formatTemperature(range.min, unit), max: formatTemperature(range.max, unit) })
    : words('page.sacs.band.range', { min: formatPercent(range.min), max: formatPercent(range.max) });
}

/** "Temperature 30.0 °C, above the band (24.0 °C to 28.0 °C)": a reading outside the band, in words. */
export function readingAlertText(
  alert: { kind: 'temperature' | 'humidity'; value: number; side: BandSide },
  band: IncubationBand,
  unit: TemperatureUnit,
): string {
  const temperature = alert.kind === 'temperature';
  return words(`page.sacs.band.alert.${alert.kind}.${alert.side}`, {
    value: temperature ? formatTemperature(alert.value, unit) : formatPercent(alert.value),
    range: rangeText(alert.kind, temperature ? band.temperatureC : band.humidityPercent, unit),
  });
}

import { HUMIDITY_LIMITS, TEMPERATURE_LIMITS_C } from './care-log.types.js';
import { formatTemperature } from '../time/temperature.js';
import type { TemperatureUnit } from '../auth/auth.types.js';
import { ruleText, type RuleText } from '../errors/rule-text.js';

export interface Range {
  min: number;
  max: number;
}

/** The target band a sac's incubator readings should stay in. */
export interface IncubationBand {
  temperatureC: Range;
  humidityPercent: Range;
}

/**
 * Defaults: 24–28 °C and 70–85 % relative humidity, artificial incubation as keepers do it
 * (docs/trade-facts.md §4, from memory). Each sac may set its own band.
 */
export const DEFAULT_INCUBATION_BAND: IncubationBand = Object.freeze({
  temperatureC: Object.freeze({ min: 24, max: 28 }),
  humidityPercent: Object.freeze({ min: 70, max: 85 }),
});

/** Where the default band comes from, shown next to it. */
export const INCUBATION_BAND_SOURCE = 'Usual keeper practice for artificial incubation (trade facts §4, from memory)';

export type BandSide = 'below' | 'above';

/** Where a reading lies against its range: null inside (the ends included), else the side it left by. */
export function outsideRange(value: number, range: Range): BandSide | null {
  if (value < range.min) return 'below';
  if (value > range.max) return 'above';
  return null;
}

/** Why a band cannot be stored (null when it can): each range within the plausible readings and min below max. */
export function bandProblem(what: 'temperature' | 'humidity', range: Range): RuleText | null {
  const limits = what === 'temperature' ? TEMPERATURE_LIMITS_C : HUMIDITY_LIMITS;
  for (const v of [range.min, range.max]) {
    if (!Number.isFinite(v) || v < limits.min || v > limits.max) return ruleText(`band.${what}Outside`, { lo: limits.min, hi: limits.max, value: v });
  }
  if (range.min >= range.max) return ruleText(`band.${what}UpsideDown`, { lo: range.min, hi: range.max });
  return null;
}

/** "24.0 °C to 28.0 °C" in the viewer's unit, or "70 to 85 %". */
export function bandRangeWords(kind: 'temperature' | 'humidity', range: Range, unit: TemperatureUnit): string {
  return kind === 'temperature' ? `${formatTemperature(range.min, unit)} to ${formatTemperature(range.max, unit)}` : `${range.min} to ${range.max} %`;
}

/** "Temperature 30.0 °C, above the band (24.0 °C to 28.0 °C)": a reading outside the band, in words. */
export function readingAlertWords(
  alert: { kind: 'temperature' | 'humidity'; value: number; side: BandSide },
  band: IncubationBand,
  unit: TemperatureUnit,
): string {
  const temperature = alert.kind === 'temperature';
  const value = temperature ? formatTemperature(alert.value, unit) : `${alert.value} %`;
  const range = temperature ? band.temperatureC : band.humidityPercent;
  return `${temperature ? 'Temperature' : 'Humidity'} ${value}, ${alert.side} the band (${bandRangeWords(alert.kind, range, unit)})`;
}

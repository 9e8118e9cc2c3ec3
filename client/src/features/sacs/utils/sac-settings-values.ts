import {
  HUMIDITY_LIMITS,
  PULL_DAY_MAX,
  ROLL_INTERVAL_LIMITS,
  TEMPERATURE_LIMITS_C,
  type Range,
  type SacResponse,
  type UpdateSacRequest,
  type Words,
} from '@broodsilk/shared';
import { readNumber, type NumberRule } from '@/components/fields/typed-number';

/** The settings form holds text as typed; empty pull days or band ends mean "the usual ones". */
export interface SacSettingsValues {
  container: string;
  pullFromDay: string;
  pullToDay: string;
  rollIntervalHours: string;
  temperatureMin: string;
  temperatureMax: string;
  humidityMin: string;
  humidityMax: string;
}

/** The rules of the number fields; the refusal of a missing roll interval in the reader's words. */
export const settingsRules = (t: Words): Record<Exclude<keyof SacSettingsValues, 'container'>, NumberRule> => ({
  pullFromDay: { min: 0, max: PULL_DAY_MAX, decimals: 0 },
  pullToDay: { min: 0, max: PULL_DAY_MAX, decimals: 0 },
  rollIntervalHours: {
    required: t('page.sacs.settings.rollHoursRequired'),
    min: ROLL_INTERVAL_LIMITS.minHours,
    max: ROLL_INTERVAL_LIMITS.maxHours,
    decimals: 0,
  },
  temperatureMin: { ...TEMPERATURE_LIMITS_C, decimals: 1 },
  temperatureMax: { ...TEMPERATURE_LIMITS_C, decimals: 1 },
  humidityMin: { ...HUMIDITY_LIMITS, decimals: 0 },
  humidityMax: { ...HUMIDITY_LIMITS, decimals: 0 },
});

const text = (n: number | null | undefined) => (n === null || n === undefined ? '' : String(n));

export function settingsValuesOf(sac: SacResponse): SacSettingsValues {
  const own = sac.band.origin === 'sac';
  return {
    container: sac.container ?? '',
    pullFromDay: sac.pullWindow.origin === 'sac' ? text(sac.pullWindow.fromDay) : '',
    pullToDay: sac.pullWindow.origin === 'sac' ? text(sac.pullWindow.toDay) : '',
    rollIntervalHours: text(sac.rollIntervalHours),
    temperatureMin: own ? text(sac.band.temperatureC.min) : '',
    temperatureMax: own ? text(sac.band.temperatureC.max) : '',
    humidityMin: own ? text(sac.band.humidityPercent.min) : '',
    humidityMax: own ? text(sac.band.humidityPercent.max) : '',
  };
}

/** Both ends, or null when both are empty; one end alone is left for the server to refuse with its message. */
function range(min: string, max: string): Range | null {
  const [lo, hi] = [readNumber(min), readNumber(max)];
  if (lo === null && hi === null) return null;
  return { min: lo ?? Number.NaN, max: hi ?? Number.NaN };
}

/** Checked values → the request (the server checks the ranges together and answers per field). */
export function settingsRequest(v: SacSettingsValues): UpdateSacRequest {
  return {
    container: v.container.trim() || null,
    pullFromDay: readNumber(v.pullFromDay),
    pullToDay: readNumber(v.pullToDay),
    rollIntervalHours: readNumber(v.rollIntervalHours) ?? undefined,
    temperatureBand: range(v.temperatureMin, v.temperatureMax),
    humidityBand: range(v.humidityMin, v.humidityMax),
  };
}

/** One end of a range without the other: said next to the empty one. */
export function halfRange(t: Words, min: string, max: string, what: 'pullWindow' | 'temperature' | 'humidity'): string | null {
  return (min.trim() === '') !== (max.trim() === '') ? t(`page.sacs.settings.halfRange.${what}`) : null;
}

import {
  BROOD_STAGES,
  HUMIDITY_LIMITS,
  TEMPERATURE_LIMITS_C,
  broodStageIndex,
  celsiusToFahrenheit,
  fahrenheitToCelsius,
  type BroodStage,
  type CareLogKind,
} from '@broodsilk/shared';
import { fieldError } from '../common/field-errors';
import type { CareLogEntryDto } from './dto/care-log-entry.dto';
import { refusal } from '../common/refusal';

/** Which value fields each kind takes; any other value field is refused so nothing is silently dropped. */
const FIELDS: Record<CareLogKind, (keyof CareLogEntryDto)[]> = {
  roll: ['text'],
  temperature: ['temperature', 'text'],
  humidity: ['humidityPercent', 'text'],
  check: ['text'],
  stage: ['stage', 'text'],
  note: ['text'],
  strike: ['strikes', 'reason'],
};
const VALUE_FIELDS: (keyof CareLogEntryDto)[] = ['temperature', 'humidityPercent', 'stage', 'text', 'strikes', 'reason'];

export interface EntryValues {
  temperatureC: number | null;
  enteredValue: number | null;
  enteredUnit: 'C' | 'F' | null;
  humidityPercent: number | null;
  stage: BroodStage | null;
  text: string | null;
}

/** Checks the value fields of one entry and returns what is stored (temperatures in °C). */
export function entryValues(dto: CareLogEntryDto): EntryValues {
  for (const f of VALUE_FIELDS) {
    if (dto[f] !== undefined && !FIELDS[dto.kind].includes(f)) throw fieldError(f, refusal('careLog.fieldNotOfKind', { kind: dto.kind, field: f }));
  }
  const out: EntryValues = { temperatureC: null, enteredValue: null, enteredUnit: null, humidityPercent: null, stage: null, text: dto.text?.trim() || null };
  if (dto.kind === 'temperature') {
    if (!dto.temperature) throw fieldError('temperature', refusal('careLog.temperatureShape'));
    const { value, unit } = dto.temperature;
    const c = unit === 'F' ? fahrenheitToCelsius(value) : value;
    if (c < TEMPERATURE_LIMITS_C.min || c > TEMPERATURE_LIMITS_C.max) {
      const [lo, hi] =
        unit === 'F'
          ? [celsiusToFahrenheit(TEMPERATURE_LIMITS_C.min), celsiusToFahrenheit(TEMPERATURE_LIMITS_C.max)]
          : [TEMPERATURE_LIMITS_C.min, TEMPERATURE_LIMITS_C.max];
      throw fieldError('temperature.value', refusal('careLog.temperatureImplausible', { value, unit, lo, hi }));
    }
    Object.assign(out, { temperatureC: c, enteredValue: value, enteredUnit: unit });
  }
  if (dto.kind === 'humidity') {
    const h = dto.humidityPercent;
    if (h === undefined) throw fieldError('humidityPercent', refusal('careLog.humidityNeeded'));
    if (h < HUMIDITY_LIMITS.min || h > HUMIDITY_LIMITS.max) throw fieldError('humidityPercent', refusal('careLog.humidityRange', { value: h }));
    out.humidityPercent = h;
  }
  if (dto.kind === 'note' && !out.text) throw fieldError('text', refusal('careLog.noteText'));
  if (dto.kind === 'stage' && !dto.stage) throw fieldError('stage', refusal('careLog.stageNeeded', { stages: BROOD_STAGES.join(', ') }));
  if (dto.stage) out.stage = dto.stage;
  return out;
}

/** A stage entry moves forward (stages may be skipped) or back to eggs to undo a mistaken entry. */
export function assertStageMove(current: BroodStage, next: BroodStage): void {
  if (next === current) throw fieldError('stage', refusal('careLog.stageSame', { stage: next }));
  if (broodStageIndex(next) < broodStageIndex(current) && next !== 'eggs') {
    throw fieldError('stage', refusal('careLog.stageBack', { current }));
  }
}

import type { Language, Me, StageNumbering, TemperatureUnit, UpdateProfileRequest } from '@broodsilk/shared';

/** The profile form's values: the text as typed and the choices as picked. */
export interface ProfileFormValues {
  displayName: string;
  timeZone: string;
  language: Language;
  temperatureUnit: TemperatureUnit;
  stageNumbering: StageNumbering;
}

export function toProfileValues(me: Me): ProfileFormValues {
  return { displayName: me.displayName, timeZone: me.timeZone, language: me.language, temperatureUnit: me.temperatureUnit, stageNumbering: me.stageNumbering };
}

/** The request: every field as given (the server refuses what it cannot keep). */
export function toProfileRequest(v: ProfileFormValues): UpdateProfileRequest {
  return { displayName: v.displayName, timeZone: v.timeZone, language: v.language, temperatureUnit: v.temperatureUnit, stageNumbering: v.stageNumbering };
}

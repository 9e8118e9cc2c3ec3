import { IsIn, IsNotEmpty, IsString, MaxLength } from 'class-validator';
import { Transform } from 'class-transformer';
import {
  LANGUAGES,
  STAGE_NUMBERINGS,
  TEMPERATURE_UNITS,
  type Language,
  type StageNumbering,
  type TemperatureUnit,
  type UpdateProfileRequest,
  TEXT_LIMITS,
} from '@broodsilk/shared';
import { IsTimeZone } from '../../common/validators/is-time-zone.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class UpdateProfileDto implements UpdateProfileRequest {
  @IsOptionalNonNull()
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @IsString()
  @IsNotEmpty({ context: keyedBy('dto.profile.displayName') })
  @MaxLength(TEXT_LIMITS.displayName)
  displayName?: string;

  @IsOptionalNonNull()
  @IsTimeZone()
  timeZone?: string;

  @IsOptionalNonNull()
  @IsIn(TEMPERATURE_UNITS, { context: keyedBy('dto.profile.temperatureUnit', { allowed: TEMPERATURE_UNITS.join(', ') }) })
  temperatureUnit?: TemperatureUnit;

  @IsOptionalNonNull()
  @IsIn(LANGUAGES, { context: keyedBy('dto.common.languageOneOf', { allowed: LANGUAGES.join(', ') }) })
  language?: Language;

  @IsOptionalNonNull()
  @IsIn(STAGE_NUMBERINGS, { context: keyedBy('dto.profile.stageNumbering', { allowed: STAGE_NUMBERINGS.join(', ') }) })
  stageNumbering?: StageNumbering;
}

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

export class UpdateProfileDto implements UpdateProfileRequest {
  @IsOptionalNonNull()
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @IsString()
  @IsNotEmpty({ message: 'Your display name cannot be empty.' })
  @MaxLength(TEXT_LIMITS.displayName)
  displayName?: string;

  @IsOptionalNonNull()
  @IsTimeZone()
  timeZone?: string;

  @IsOptionalNonNull()
  @IsIn(TEMPERATURE_UNITS, { message: `Choose one of the temperature units ${TEMPERATURE_UNITS.join(', ')} (°C or °F).` })
  temperatureUnit?: TemperatureUnit;

  @IsOptionalNonNull()
  @IsIn(LANGUAGES, { message: `Choose one of the languages ${LANGUAGES.join(', ')}.` })
  language?: Language;

  @IsOptionalNonNull()
  @IsIn(STAGE_NUMBERINGS, { message: `Choose one of the stage numberings ${STAGE_NUMBERINGS.join(', ')}.` })
  stageNumbering?: StageNumbering;
}

import { Type } from 'class-transformer';
import { IsDefined, IsIn, IsNumber, IsString, IsUUID, MaxLength, ValidateNested } from 'class-validator';
import {
  BROOD_STAGES,
  CARE_LOG_KINDS,
  TEMPERATURE_UNITS,
  type BroodStage,
  type CareLogKind,
  type CareLogRequest,
  type TemperatureUnit,
  TEXT_LIMITS,
} from '@broodsilk/shared';
import { IsInstant } from '../../common/validators/is-instant.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

export class TemperatureReadingDto {
  @IsDefined({ message: 'Give the temperature value.' })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'The temperature must be a number, e.g. 26.5.' })
  value!: number;

  @IsIn(TEMPERATURE_UNITS, { message: 'The temperature unit must be C or F.' })
  unit!: TemperatureUnit;
}

export class CareLogEntryDto implements CareLogRequest {
  @IsIn(CARE_LOG_KINDS, { message: `The kind of entry must be one of: ${CARE_LOG_KINDS.join(', ')}.` })
  kind!: CareLogKind;

  @IsOptionalNonNull()
  @IsInstant({ message: 'The time of the entry must be a date and time with its offset, e.g. 2026-03-08T07:30:00Z.' })
  at?: string;

  @IsOptionalNonNull()
  @ValidateNested()
  @Type(() => TemperatureReadingDto)
  temperature?: TemperatureReadingDto;

  @IsOptionalNonNull()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'The humidity must be a number of percent, e.g. 75.' })
  humidityPercent?: number;

  @IsOptionalNonNull()
  @IsIn(BROOD_STAGES, { message: `The stage must be one of: ${BROOD_STAGES.join(', ')}.` })
  stage?: BroodStage;

  @IsOptionalNonNull()
  @IsString()
  @MaxLength(TEXT_LIMITS.note, { message: `Keep the text under ${TEXT_LIMITS.note} characters.` })
  text?: string;

  @IsOptionalNonNull()
  @IsUUID('all', { message: 'strikes must be the id of the entry to strike.' })
  strikes?: string;

  @IsOptionalNonNull()
  @IsString()
  @MaxLength(TEXT_LIMITS.correctionReason, { message: `Keep the reason under ${TEXT_LIMITS.correctionReason} characters.` })
  reason?: string;
}

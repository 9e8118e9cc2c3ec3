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
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class TemperatureReadingDto {
  @IsDefined({ context: keyedBy('dto.careLog.temperatureNeeded') })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { context: keyedBy('dto.careLog.temperatureNumber') })
  value!: number;

  @IsIn(TEMPERATURE_UNITS, { context: keyedBy('dto.careLog.temperatureUnit') })
  unit!: TemperatureUnit;
}

export class CareLogEntryDto implements CareLogRequest {
  @IsIn(CARE_LOG_KINDS, { context: keyedBy('dto.common.entryKindOneOf', { allowed: CARE_LOG_KINDS.join(', ') }) })
  kind!: CareLogKind;

  @IsOptionalNonNull()
  @IsInstant({ context: keyedBy('dto.careLog.at') })
  at?: string;

  @IsOptionalNonNull()
  @ValidateNested()
  @Type(() => TemperatureReadingDto)
  temperature?: TemperatureReadingDto;

  @IsOptionalNonNull()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { context: keyedBy('dto.careLog.humidity') })
  humidityPercent?: number;

  @IsOptionalNonNull()
  @IsIn(BROOD_STAGES, { context: keyedBy('dto.common.stageOneOf', { allowed: BROOD_STAGES.join(', ') }) })
  stage?: BroodStage;

  @IsOptionalNonNull()
  @IsString()
  @MaxLength(TEXT_LIMITS.note, { context: keyedBy('dto.careLog.textUnder', { max: TEXT_LIMITS.note }) })
  text?: string;

  @IsOptionalNonNull()
  @IsUUID('all', { context: keyedBy('dto.common.strikesId') })
  strikes?: string;

  @IsOptionalNonNull()
  @IsString()
  @MaxLength(TEXT_LIMITS.correctionReason, { context: keyedBy('dto.common.reasonUnder', { max: TEXT_LIMITS.correctionReason }) })
  reason?: string;
}

import { Type } from 'class-transformer';
import { IsBoolean, IsDefined, IsInt, IsNumber, IsOptional, IsString, Max, MaxLength, Min, ValidateIf, ValidateNested } from 'class-validator';
import { PULL_DAY_MAX, ROLL_INTERVAL_LIMITS, TEXT_LIMITS, type CreateSacRequest, type Range } from '@broodsilk/shared';
import { IsCalendarDate } from '../../common/validators/is-calendar-date.validator';
import { IsInstant } from '../../common/validators/is-instant.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { AcknowledgedWarningsDto } from '../../plausibility/acknowledged-warnings.dto';
import { keyedBy } from '../../common/filters/validation-exception.factory';

const FROM_DAY = { context: keyedBy('dto.sac.pullFromDay', { max: PULL_DAY_MAX }) };
const TO_DAY = { context: keyedBy('dto.sac.pullToDay', { max: PULL_DAY_MAX }) };

/** A band's two ends; whether they make a band is checked by the shared `bandProblem`. */
export class RangeDto implements Range {
  @IsDefined({ context: keyedBy('dto.sac.bandLowNeeded') })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { context: keyedBy('dto.sac.bandLowNumber') })
  min!: number;

  @IsDefined({ context: keyedBy('dto.sac.bandHighNeeded') })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { context: keyedBy('dto.sac.bandHighNumber') })
  max!: number;
}

export class CreateSacDto extends AcknowledgedWarningsDto implements CreateSacRequest {
  @IsCalendarDate({ context: keyedBy('dto.sac.layDate') })
  layDate!: string;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsInstant({ context: keyedBy('dto.sac.pullTime') })
  pulledAt?: string | null;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsInt(FROM_DAY)
  @Min(0, FROM_DAY)
  @Max(PULL_DAY_MAX, FROM_DAY)
  pullFromDay?: number | null;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsInt(TO_DAY)
  @Min(0, TO_DAY)
  @Max(PULL_DAY_MAX, TO_DAY)
  pullToDay?: number | null;

  @IsOptionalNonNull()
  @IsInt({ context: keyedBy('dto.sac.rollWhole') })
  @Min(ROLL_INTERVAL_LIMITS.minHours, { context: keyedBy('dto.sac.rollMin', { min: ROLL_INTERVAL_LIMITS.minHours }) })
  @Max(ROLL_INTERVAL_LIMITS.maxHours, { context: keyedBy('dto.sac.rollMax', { max: ROLL_INTERVAL_LIMITS.maxHours }) })
  rollIntervalHours?: number;

  @IsOptionalNonNull()
  @IsBoolean()
  rollingOff?: boolean;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.note)
  notes?: string | null;

  @IsOptionalNonNull()
  @IsBoolean()
  leftWithMother?: boolean;

  @IsOptionalNonNull()
  @IsBoolean()
  rollPastLegs?: boolean;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString({ context: keyedBy('dto.sac.containerText') })
  @MaxLength(TEXT_LIMITS.enclosure, { context: keyedBy('dto.sac.containerMax', { max: TEXT_LIMITS.enclosure }) })
  container?: string | null;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @ValidateNested()
  @Type(() => RangeDto)
  temperatureBand?: RangeDto | null;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @ValidateNested()
  @Type(() => RangeDto)
  humidityBand?: RangeDto | null;
}

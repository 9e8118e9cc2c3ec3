import { Type } from 'class-transformer';
import { IsBoolean, IsDefined, IsInt, IsNumber, IsOptional, IsString, Max, MaxLength, Min, ValidateIf, ValidateNested } from 'class-validator';
import { PULL_DAY_MAX, ROLL_INTERVAL_LIMITS, TEXT_LIMITS, type CreateSacRequest, type Range } from '@broodsilk/shared';
import { IsCalendarDate } from '../../common/validators/is-calendar-date.validator';
import { IsInstant } from '../../common/validators/is-instant.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { AcknowledgedWarningsDto } from '../../plausibility/acknowledged-warnings.dto';

const dayRule = (what: string) => ({ message: `The ${what} must be a whole day number from 0 to ${PULL_DAY_MAX}.` });

/** A band's two ends; whether they make a band is checked by the shared `bandProblem`. */
export class RangeDto implements Range {
  @IsDefined({ message: 'Give the lowest value of the band.' })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'The lowest value of the band must be a number.' })
  min!: number;

  @IsDefined({ message: 'Give the highest value of the band.' })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'The highest value of the band must be a number.' })
  max!: number;
}

export class CreateSacDto extends AcknowledgedWarningsDto implements CreateSacRequest {
  @IsCalendarDate({ message: 'The lay date must be a date written YYYY-MM-DD.' })
  layDate!: string;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsInstant({ message: 'The pull time must be a date and time with its offset, e.g. 2026-03-08T07:30:00Z.' })
  pulledAt?: string | null;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsInt(dayRule('first pull day'))
  @Min(0, dayRule('first pull day'))
  @Max(PULL_DAY_MAX, dayRule('first pull day'))
  pullFromDay?: number | null;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsInt(dayRule('last pull day'))
  @Min(0, dayRule('last pull day'))
  @Max(PULL_DAY_MAX, dayRule('last pull day'))
  pullToDay?: number | null;

  @IsOptionalNonNull()
  @IsInt({ message: 'The roll interval must be a whole number of hours.' })
  @Min(ROLL_INTERVAL_LIMITS.minHours, { message: `The roll interval must be at least ${ROLL_INTERVAL_LIMITS.minHours} hour.` })
  @Max(ROLL_INTERVAL_LIMITS.maxHours, { message: `The roll interval cannot be more than ${ROLL_INTERVAL_LIMITS.maxHours} hours.` })
  rollIntervalHours?: number;

  @IsOptionalNonNull()
  @IsBoolean({ message: 'rollingOff must be true or false.' })
  rollingOff?: boolean;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.note)
  notes?: string | null;

  @IsOptionalNonNull()
  @IsBoolean({ message: 'leftWithMother must be true or false.' })
  leftWithMother?: boolean;

  @IsOptionalNonNull()
  @IsBoolean({ message: 'rollPastLegs must be true or false.' })
  rollPastLegs?: boolean;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString({ message: 'The incubator or container must be text.' })
  @MaxLength(TEXT_LIMITS.enclosure, { message: `Name the incubator or container in at most ${TEXT_LIMITS.enclosure} characters.` })
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

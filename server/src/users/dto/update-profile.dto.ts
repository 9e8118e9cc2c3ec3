import { IsIn, IsNotEmpty, IsString, MaxLength } from 'class-validator';
import { Transform } from 'class-transformer';
import { TEMPERATURE_UNITS, type TemperatureUnit, type UpdateProfileRequest, TEXT_LIMITS } from '@broodsilk/shared';
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
  @IsIn(TEMPERATURE_UNITS, { message: 'Choose °C or °F.' })
  temperatureUnit?: TemperatureUnit;
}

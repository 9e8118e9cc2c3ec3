import { Type } from 'class-transformer';
import { IsBoolean, IsIn, IsNumber, IsOptional, IsString, Max, MaxLength, Min, ValidateIf } from 'class-validator';
import { EXUVIA_SEXES, type CreateMoltRequest, type ExuviaSex, TEXT_LIMITS } from '@broodsilk/shared';
import { IsCalendarDate } from '../../common/validators/is-calendar-date.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

export class CreateMoltDto implements CreateMoltRequest {
  @IsCalendarDate({ message: 'The molt date must be a date written YYYY-MM-DD.' })
  moltedOn!: string;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsIn(EXUVIA_SEXES, { message: `The exuvia result must be one of: ${EXUVIA_SEXES.join(', ')}.` })
  exuviaSex?: ExuviaSex | null;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @Type(() => Number)
  @IsNumber({ maxDecimalPlaces: 1 }, { message: 'The size is in centimetres with at most one decimal, e.g. 12.5.' })
  @Min(0.1, { message: 'The size must be more than 0 cm.' })
  @Max(40, { message: 'The size cannot be more than 40 cm.' })
  sizeCm?: number | null;

  @IsOptionalNonNull()
  @IsBoolean({ message: 'maturing must be true or false.' })
  maturing?: boolean;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.note)
  notes?: string | null;
}

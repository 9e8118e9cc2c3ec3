import { Type } from 'class-transformer';
import { IsBoolean, IsIn, IsNumber, IsOptional, IsString, Max, MaxLength, Min, ValidateIf } from 'class-validator';
import { EXUVIA_SEXES, type CreateMoltRequest, type ExuviaSex, TEXT_LIMITS } from '@broodsilk/shared';
import { IsCalendarDate } from '../../common/validators/is-calendar-date.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { keyedBy } from '../../common/filters/validation-exception.factory';

const SIZE_MAX_CM = 40;

export class CreateMoltDto implements CreateMoltRequest {
  @IsCalendarDate({ context: keyedBy('dto.molt.moltedOn') })
  moltedOn!: string;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsIn(EXUVIA_SEXES, { context: keyedBy('dto.molt.exuvia', { allowed: EXUVIA_SEXES.join(', ') }) })
  exuviaSex?: ExuviaSex | null;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @Type(() => Number)
  @IsNumber({ maxDecimalPlaces: 1 }, { context: keyedBy('dto.molt.sizeNumber') })
  @Min(0.1, { context: keyedBy('dto.molt.sizeMin') })
  @Max(SIZE_MAX_CM, { context: keyedBy('dto.molt.sizeMax', { max: SIZE_MAX_CM }) })
  sizeCm?: number | null;

  @IsOptionalNonNull()
  @IsBoolean()
  maturing?: boolean;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.note)
  notes?: string | null;
}

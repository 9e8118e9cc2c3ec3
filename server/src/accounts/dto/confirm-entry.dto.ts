import { IsInt, Max, Min } from 'class-validator';
import type { ConfirmEntryRequest } from '@broodsilk/shared';
import { IsCalendarDate } from '../../common/validators/is-calendar-date.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

export class ConfirmEntryDto implements ConfirmEntryRequest {
  @IsOptionalNonNull()
  @IsInt({ message: 'arrivedAlive must be a whole number.' })
  @Min(0, { message: 'arrivedAlive cannot be negative.' })
  @Max(100_000)
  arrivedAlive?: number;

  @IsOptionalNonNull()
  @IsInt({ message: 'arrivedDead must be a whole number.' })
  @Min(0, { message: 'arrivedDead cannot be negative.' })
  @Max(100_000)
  arrivedDead?: number;

  @IsOptionalNonNull()
  @IsCalendarDate()
  date?: string;
}

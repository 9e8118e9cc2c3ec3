import { IsInt, IsOptional, Max, Min } from 'class-validator';
import type { ConfirmEntryRequest } from '@broodsilk/shared';
import { IsCalendarDate } from '../../common/validators/is-calendar-date.validator';

export class ConfirmEntryDto implements ConfirmEntryRequest {
  @IsOptional()
  @IsInt({ message: 'arrivedAlive must be a whole number.' })
  @Min(0, { message: 'arrivedAlive cannot be negative.' })
  @Max(100_000)
  arrivedAlive?: number;

  @IsOptional()
  @IsInt({ message: 'arrivedDead must be a whole number.' })
  @Min(0, { message: 'arrivedDead cannot be negative.' })
  @Max(100_000)
  arrivedDead?: number;

  @IsOptional()
  @IsCalendarDate()
  date?: string;
}

import { IsInt, Max, Min } from 'class-validator';
import type { ConfirmEntryRequest } from '@broodsilk/shared';
import { IsCalendarDate } from '../../common/validators/is-calendar-date.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class ConfirmEntryDto implements ConfirmEntryRequest {
  @IsOptionalNonNull()
  @IsInt()
  @Min(0, { context: keyedBy('dto.common.notNegative', { field: 'arrivedAlive' }) })
  @Max(100_000)
  arrivedAlive?: number;

  @IsOptionalNonNull()
  @IsInt()
  @Min(0, { context: keyedBy('dto.common.notNegative', { field: 'arrivedDead' }) })
  @Max(100_000)
  arrivedDead?: number;

  @IsOptionalNonNull()
  @IsCalendarDate()
  date?: string;
}

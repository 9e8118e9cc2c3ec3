import { Type } from 'class-transformer';
import { IsInt, IsUUID, Max, Min } from 'class-validator';
import type { ActivityTimelineQuery } from '@broodsilk/shared';
import { IsOptionalNonNull } from '../common/validators/is-optional-non-null.validator';
import { keyedBy } from '../common/filters/validation-exception.factory';

export const TIMELINE_PAGE = 200;

export class ActivityTimelineQueryDto implements ActivityTimelineQuery {
  @IsOptionalNonNull()
  @IsUUID('all', { context: keyedBy('dto.timeline.before') })
  before?: string;

  @IsOptionalNonNull()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(TIMELINE_PAGE)
  limit?: number;
}

import { Type } from 'class-transformer';
import { IsInt, IsUUID, Max, Min } from 'class-validator';
import type { ActivityTimelineQuery } from '@broodsilk/shared';
import { IsOptionalNonNull } from '../common/validators/is-optional-non-null.validator';

export const TIMELINE_PAGE = 200;

export class ActivityTimelineQueryDto implements ActivityTimelineQuery {
  @IsOptionalNonNull()
  @IsUUID('all', { message: 'before must be the id of an event of this timeline.' })
  before?: string;

  @IsOptionalNonNull()
  @Type(() => Number)
  @IsInt({ message: 'limit must be a whole number.' })
  @Min(1, { message: 'limit must be at least 1.' })
  @Max(TIMELINE_PAGE, { message: `limit can be at most ${TIMELINE_PAGE}.` })
  limit?: number;
}

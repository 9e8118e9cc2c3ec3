import { Type } from 'class-transformer';
import { IsInt, Max, Min } from 'class-validator';
import type { NotificationListQuery } from '@broodsilk/shared';
import { IsListOffset } from '../../common/validators/is-list-offset.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

export class NotificationListQueryDto implements NotificationListQuery {
  @IsOptionalNonNull()
  @Type(() => Number)
  @IsInt({ message: 'limit must be a whole number.' })
  @Min(1, { message: 'limit must be at least 1.' })
  @Max(100, { message: 'limit can be at most 100.' })
  limit?: number;

  @IsListOffset()
  offset?: number;
}

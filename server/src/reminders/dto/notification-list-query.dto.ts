import { Type } from 'class-transformer';
import { IsInt, Max, Min } from 'class-validator';
import type { NotificationListQuery } from '@broodsilk/shared';
import { IsListOffset } from '../../common/validators/is-list-offset.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

export class NotificationListQueryDto implements NotificationListQuery {
  @IsOptionalNonNull()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(100)
  limit?: number;

  @IsListOffset()
  offset?: number;
}

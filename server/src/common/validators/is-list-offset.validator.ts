import { applyDecorators } from '@nestjs/common';
import { Type } from 'class-transformer';
import { IsInt, Max, Min } from 'class-validator';
import { IsOptionalNonNull } from './is-optional-non-null.validator';

/** Far beyond any list a keeper has, and well inside PostgreSQL's bigint OFFSET (1e19 would fail there as a 500). */
export const MAX_LIST_OFFSET = 1_000_000;

/** The optional `offset` query parameter of a paged list. */
export function IsListOffset(): PropertyDecorator {
  return applyDecorators(
    IsOptionalNonNull(),
    Type(() => Number),
    IsInt({ message: 'offset must be a whole number.' }),
    Min(0, { message: 'offset cannot be negative.' }),
    Max(MAX_LIST_OFFSET, { message: `offset can be at most ${MAX_LIST_OFFSET}.` }),
  );
}

import { applyDecorators } from '@nestjs/common';
import { Type } from 'class-transformer';
import { IsInt, Max, Min } from 'class-validator';
import { IsOptionalNonNull } from './is-optional-non-null.validator';
import { keyedBy } from '../filters/validation-exception.factory';

/** Far beyond any list a keeper has, and well inside PostgreSQL's bigint OFFSET (1e19 would fail there as a 500). */
export const MAX_LIST_OFFSET = 1_000_000;

/** The optional `offset` query parameter of a paged list. */
export function IsListOffset(): PropertyDecorator {
  return applyDecorators(
    IsOptionalNonNull(),
    Type(() => Number),
    IsInt({ context: keyedBy('field.offsetWhole') }),
    Min(0, { context: keyedBy('field.offsetNegative') }),
    Max(MAX_LIST_OFFSET, { context: keyedBy('field.offsetMax', { max: MAX_LIST_OFFSET }) }),
  );
}

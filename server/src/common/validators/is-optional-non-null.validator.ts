import { applyDecorators } from '@nestjs/common';
import { IsDefined, ValidateIf } from 'class-validator';

/**
 * An optional field that may be left out but not sent as null. class-validator's `@IsOptional()`
 * lets null through unchecked, and null then reaches the database as "clear this", or as a NOT
 * NULL violation. Fields where null does mean "clear" keep `@IsOptional()` with
 * `@ValidateIf((_, v) => v !== null)` and say `| null` in their type.
 */
export function IsOptionalNonNull(): PropertyDecorator {
  return applyDecorators(
    ValidateIf((_, value) => value !== undefined),
    IsDefined(),
  );
}

import type { BadRequestException, ValidationError } from '@nestjs/common';
import type { FieldError } from '@broodsilk/shared';
import { badRequest } from '../field-errors';

function flatten(errors: ValidationError[], prefix = ''): FieldError[] {
  return errors.flatMap((e) => {
    const field = prefix ? `${prefix}.${e.property}` : e.property;
    // A null where a value is needed fails every check on the field; saying so once is enough.
    const constraints = e.constraints?.isDefined ? { isDefined: e.constraints.isDefined } : (e.constraints ?? {});
    const own = Object.values(constraints).map((message) => ({ field, message: humanise(message, field) }));
    return [...own, ...flatten(e.children ?? [], field)];
  });
}

/** class-validator says "property foo should not exist"; say it so a person understands. */
function humanise(message: string, field: string): string {
  if (message.endsWith('should not exist')) return `"${field}" is not a field this form accepts.`;
  return message;
}

export function validationExceptionFactory(errors: ValidationError[]): BadRequestException {
  return badRequest(flatten(errors));
}

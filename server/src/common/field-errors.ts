import { BadRequestException } from '@nestjs/common';
import type { FieldError } from '@broodsilk/shared';

/** The 400 every refusal of typed input uses: one sentence for one field, else the list of fields. */
export function badRequest(errors: FieldError[]): BadRequestException {
  const message = errors.length === 1 ? errors[0].message : `Please correct ${errors.length} fields: ${errors.map((d) => d.field).join(', ')}.`;
  return new BadRequestException({ message, details: errors });
}

export function fieldError(field: string, message: string): BadRequestException {
  return badRequest([{ field, message }]);
}

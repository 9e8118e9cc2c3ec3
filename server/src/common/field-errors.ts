import { BadRequestException } from '@nestjs/common';
import type { FieldError } from '@broodsilk/shared';
import { refusal, type Said } from './refusal';

/** The 400 every refusal of typed input uses: one sentence for one field, else the list of fields. */
export function badRequest(errors: FieldError[]): BadRequestException {
  const summary = errors.length === 1 ? errors[0] : refusal('common.correctFields', { count: errors.length, fields: errors.map((d) => d.field).join(', ') });
  return new BadRequestException({ message: summary.message, key: summary.key, values: summary.values, details: errors });
}

/** A 400 naming one field, e.g. `fieldError('at', refusal('careLog.beforeLaid', { at, layDate }))`. */
export function fieldError(field: string, why: Said): BadRequestException {
  return badRequest([{ field, ...why }]);
}

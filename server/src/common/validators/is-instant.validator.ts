import { registerDecorator, type ValidationArguments, type ValidationOptions } from 'class-validator';
import { refusal } from '../refusal';
import { isInstant } from '@broodsilk/shared';

/** A real instant with its offset, e.g. 2026-03-08T07:30:00-05:00 or …Z (see `isInstant` in shared). */
export function IsInstant(options?: ValidationOptions) {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'isInstant',
      target: object.constructor,
      propertyName,
      options,
      // The sentence class-validator's own callers (the CSV import) read; the API's filter keys it (validation-exception.factory).
      validator: { validate: isInstant, defaultMessage: (a: ValidationArguments) => refusal('field.instant', { field: a.property }).message },
    });
}

import { registerDecorator, type ValidationOptions } from 'class-validator';
import { isInstant } from '@broodsilk/shared';

/** A real instant with its offset, e.g. 2026-03-08T07:30:00-05:00 or …Z (see `isInstant` in shared). */
export function IsInstant(options?: ValidationOptions) {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'isInstant',
      target: object.constructor,
      propertyName,
      options: { message: `${propertyName} must be a date and time with its offset, e.g. 2026-03-08T07:30:00Z.`, ...options },
      validator: { validate: isInstant },
    });
}

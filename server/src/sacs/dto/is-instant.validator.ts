import { registerDecorator, type ValidationOptions } from 'class-validator';

// Date and time with an explicit offset, so an instant is never read in the server's zone.
const INSTANT = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d{1,9})?)?(Z|[+-]\d{2}:\d{2})$/;

export function isInstant(value: unknown): value is string {
  return typeof value === 'string' && INSTANT.test(value) && !Number.isNaN(Date.parse(value));
}

/** An ISO 8601 date and time with its offset, e.g. 2026-03-08T07:30:00-05:00 or …Z. */
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

import { registerDecorator, type ValidationOptions } from 'class-validator';
import { isCalendarDate } from '@broodsilk/shared';

/** A real ISO 8601 calendar date `YYYY-MM-DD` (2025-02-29 is refused). */
export function IsCalendarDate(options?: ValidationOptions) {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'isCalendarDate',
      target: object.constructor,
      propertyName,
      options: { message: `${propertyName} must be a date written YYYY-MM-DD.`, ...options },
      validator: { validate: (value: unknown) => typeof value === 'string' && isCalendarDate(value) },
    });
}

import { registerDecorator, type ValidationArguments, type ValidationOptions } from 'class-validator';
import { refusal } from '../refusal';
import { isCalendarDate } from '@broodsilk/shared';

/** A real ISO 8601 calendar date `YYYY-MM-DD` (2025-02-29 is refused). */
export function IsCalendarDate(options?: ValidationOptions) {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'isCalendarDate',
      target: object.constructor,
      propertyName,
      options,
      // The sentence class-validator's own callers (the CSV import) read; the API's filter keys it (validation-exception.factory).
      validator: {
        validate: (value: unknown) => typeof value === 'string' && isCalendarDate(value),
        defaultMessage: (a: ValidationArguments) => refusal('field.calendarDate', { field: a.property }).message,
      },
    });
}

import { registerDecorator, type ValidationOptions } from 'class-validator';
import { refusal } from '../refusal';
import { isValidTimeZone } from '@broodsilk/shared';

/** An IANA time-zone name the runtime knows, e.g. "Europe/Berlin". */
export function IsTimeZone(options?: ValidationOptions) {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'isTimeZone',
      target: object.constructor,
      propertyName,
      options,
      // The sentence class-validator's own callers (the CSV import) read; the API's filter keys it (validation-exception.factory).
      validator: { validate: (value: unknown) => typeof value === 'string' && isValidTimeZone(value), defaultMessage: () => refusal('field.timeZone').message },
    });
}

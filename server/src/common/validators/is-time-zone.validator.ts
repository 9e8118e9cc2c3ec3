import { registerDecorator, type ValidationOptions } from 'class-validator';
import { isValidTimeZone } from '@broodsilk/shared';

/** An IANA time-zone name the runtime knows, e.g. "Europe/Berlin". */
export function IsTimeZone(options?: ValidationOptions) {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'isTimeZone',
      target: object.constructor,
      propertyName,
      options: { message: 'Choose a time zone from the list (for example Europe/Berlin).', ...options },
      validator: { validate: (value: unknown) => typeof value === 'string' && isValidTimeZone(value) },
    });
}

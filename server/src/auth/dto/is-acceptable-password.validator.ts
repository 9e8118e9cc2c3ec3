import { registerDecorator, type ValidationArguments } from 'class-validator';
import { passwordProblem } from '../password-policy';

/** A new password the policy accepts; the message says what is wrong with it. */
export function IsAcceptablePassword() {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'isAcceptablePassword',
      target: object.constructor,
      propertyName,
      options: { message: (args: ValidationArguments) => (typeof args.value === 'string' ? passwordProblem(args.value) : null) ?? 'Enter a password.' },
      validator: { validate: (value: unknown) => typeof value === 'string' && passwordProblem(value) === null },
    });
}

import { registerDecorator } from 'class-validator';
import { keyedBy } from '../../common/filters/validation-exception.factory';
import { PASSWORD_LIMITS, PASSWORD_REFUSALS, passwordProblem, passwordRefusal, type PasswordProblem } from '../password-policy';

const PROBLEMS = Object.keys(PASSWORD_REFUSALS) as (PasswordProblem | 'passwordMissing')[];

/**
 * A new password the policy accepts. One constraint per problem, each naming its catalogue
 * sentence, so the refusal is said in the reader's language; at most one of them fails.
 */
export function IsAcceptablePassword() {
  return (object: object, propertyName: string) => {
    for (const problem of PROBLEMS)
      registerDecorator({
        name: problem,
        target: object.constructor,
        propertyName,
        options: { context: keyedBy(PASSWORD_REFUSALS[problem], PASSWORD_LIMITS) },
        validator: {
          validate: (value: unknown) => (typeof value === 'string' ? passwordProblem(value) !== problem : problem !== 'passwordMissing'),
          // class-validator hands the context on only with a message, so the English is given too.
          defaultMessage: () => passwordRefusal(problem).message,
        },
      });
  };
}

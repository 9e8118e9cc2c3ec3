import type { BadRequestException, ValidationError } from '@nestjs/common';
import { getMetadataStorage } from 'class-validator';
import type { FieldError } from '@broodsilk/shared';
import { badRequest } from '../field-errors';
import { fieldRefusal, type RefusalKey, type RefusalValues } from '../refusal';

type Args = readonly unknown[];
type ValidationMetadata = ReturnType<ReturnType<typeof getMetadataStorage>['getTargetValidationMetadatas']>[number];
/** Our keyed sentence for a class-validator constraint that a DTO left without its own message. */
const CONSTRAINT_WORDS: Record<string, (field: string, args: Args, value: unknown) => FieldError> = {
  isDefined: (f, _a, value) => fieldRefusal(f, value === null ? 'field.notNull' : 'field.isDefined', { field: f }),
  whitelistValidation: (f) => fieldRefusal(f, 'field.notAccepted', { field: f }),
  nestedValidation: (f) => fieldRefusal(f, 'field.nested', { field: f }),
  isString: (f) => fieldRefusal(f, 'field.isString', { field: f }),
  isNotEmpty: (f) => fieldRefusal(f, 'field.isNotEmpty', { field: f }),
  isInt: (f) => fieldRefusal(f, 'field.isInt', { field: f }),
  isNumber: (f) => fieldRefusal(f, 'field.isNumber', { field: f }),
  isBoolean: (f) => fieldRefusal(f, 'field.isBoolean', { field: f }),
  isArray: (f) => fieldRefusal(f, 'field.isArray', { field: f }),
  isEmail: (f) => fieldRefusal(f, 'field.isEmail', { field: f }),
  isUuid: (f) => fieldRefusal(f, 'field.isUuid', { field: f }),
  matches: (f) => fieldRefusal(f, 'field.matches', { field: f }),
  min: (f, [min]) => fieldRefusal(f, 'field.min', { field: f, min: Number(min) }),
  max: (f, [max]) => fieldRefusal(f, 'field.max', { field: f, max: Number(max) }),
  minLength: (f, [min]) => fieldRefusal(f, 'field.minLength', { field: f, min: Number(min) }),
  maxLength: (f, [max]) => fieldRefusal(f, 'field.maxLength', { field: f, max: Number(max) }),
  isIn: (f, [allowed]) => fieldRefusal(f, 'field.isIn', { field: f, allowed: (allowed as unknown[]).join(', ') }),
  isEnum: (f, [, allowed]) => fieldRefusal(f, 'field.isEnum', { field: f, allowed: (allowed as unknown[]).join(', ') }),
  isCalendarDate: (f) => fieldRefusal(f, 'field.calendarDate', { field: f }),
  isInstant: (f) => fieldRefusal(f, 'field.instant', { field: f }),
  isTimeZone: (f) => fieldRefusal(f, 'field.timeZone'),
};

/** A decorator names its own sentence by key, never as `message`: `IsInt({ context: keyedBy('dto.sac.rollWhole', { … }) })`. */
export const keyedBy = (key: RefusalKey, values?: RefusalValues) => ({ refusal: { key, values } });

/** The decorator behind one failed constraint, to tell class-validator's default sentence from a DTO's own. */
function metadataOf(e: ValidationError, constraint: string): ValidationMetadata | undefined {
  if (!e.target) return undefined;
  return getMetadataStorage()
    .getTargetValidationMetadatas(e.target.constructor, '', true, false)
    .find((m) => m.propertyName === e.property && (m.name ?? m.type) === constraint);
}

/** A keyed sentence where the decorator names one or class-validator's default would reach the reader; a DTO's own sentence stays as written. */
function fieldErrorOf(e: ValidationError, field: string, constraint: string, message: string): FieldError {
  const named = (e.contexts?.[constraint] as ReturnType<typeof keyedBy> | undefined)?.refusal;
  if (named) return fieldRefusal(field, named.key, named.values);
  const meta = metadataOf(e, constraint);
  const words = CONSTRAINT_WORDS[constraint];
  const isDefault = constraint === 'whitelistValidation' || (meta !== undefined && meta.message === undefined);
  if (words && isDefault) return words(field, meta?.constraints ?? [], e.value);
  return { field, message };
}

/** Every failed constraint as a field error, keyed where our words exist (the CSV import says them per line). */
export function flatten(errors: ValidationError[], prefix = ''): FieldError[] {
  return errors.flatMap((e) => {
    const field = prefix ? `${prefix}.${e.property}` : e.property;
    // A null where a value is needed fails every check on the field; saying so once is enough.
    const constraints = e.constraints?.isDefined ? { isDefined: e.constraints.isDefined } : (e.constraints ?? {});
    const own = Object.entries(constraints).map(([name, message]) => fieldErrorOf(e, field, name, message));
    return [...own, ...flatten(e.children ?? [], field)];
  });
}

export function validationExceptionFactory(errors: ValidationError[]): BadRequestException {
  return badRequest(flatten(errors));
}

import 'reflect-metadata';
import { describe, expect, it } from 'vitest';
import { IsIn, IsInt, IsString, IsUUID, Max, MaxLength, Min, validate } from 'class-validator';
import type { ApiErrorBody } from '@broodsilk/shared';
import { validationExceptionFactory } from './validation-exception.factory';
import { inReaderLanguage } from './reader-language';
import { IsCalendarDate } from '../validators/is-calendar-date.validator';
import { IsOptionalNonNull } from '../validators/is-optional-non-null.validator';
import { IsListOffset } from '../validators/is-list-offset.validator';

class Sample {
  @IsString() name!: unknown;
  @IsInt() @Min(1) @Max(9) legs!: unknown;
  @MaxLength(3) code!: string;
  @IsIn(['female', 'male']) sex!: string;
  @IsUUID('4') speciesId!: string;
  @IsCalendarDate() on!: string;
  @IsOptionalNonNull() @IsString() note?: string | null;
  @IsInt({ message: 'The number of legs must be a whole number.' }) ownSentence!: unknown;
  @IsListOffset() offset?: unknown;
}

/** The 400 the API answers for `value`, as an English and a German reader get it. */
async function refused(value: Partial<Record<keyof Sample, unknown>>) {
  const errors = await validate(Object.assign(new Sample(), value), { whitelist: true, forbidNonWhitelisted: true, stopAtFirstError: true });
  const body = { statusCode: 400, error: 'Bad Request', ...(validationExceptionFactory(errors).getResponse() as object) } as ApiErrorBody;
  const by = (b: ApiErrorBody) => Object.fromEntries((b.details ?? []).map((d) => [d.field, d.message]));
  return { en: by(inReaderLanguage(body, 'en')), de: by(inReaderLanguage(body, 'de')) };
}

const VALID = { name: 'x', legs: 8, code: 'ab', sex: 'male', speciesId: '3f2504e0-4f89-41d3-9a0c-0305e82c3301', on: '2025-02-28', ownSentence: 1 };

describe('class-validator refusals are said in our words, in the reader’s language', () => {
  it('a default constraint message becomes our keyed sentence with the constraint’s own bound', async () => {
    const { en, de } = await refused({ ...VALID, name: 5, legs: 12, code: 'abcd', sex: 'other', speciesId: 'nope', on: '2025-02-29' });
    expect(en).toEqual({
      name: 'name must be text.',
      legs: 'legs can be at most 9.',
      code: 'code can be at most 3 characters long.',
      sex: 'sex must be one of: female, male.',
      speciesId: 'speciesId must be the id of a record.',
      // 2025 is not a leap year (ISO 8601 calendar): 29 February does not exist.
      on: 'on must be a date written YYYY-MM-DD.',
    });
    expect(de).toEqual({
      name: 'name muss Text sein.',
      legs: 'legs darf höchstens 9 sein.',
      code: 'code darf höchstens 3 Zeichen lang sein.',
      sex: 'sex muss eines davon sein: female, male.',
      speciesId: 'speciesId muss die ID eines Eintrags sein.',
      on: 'on muss ein Datum in der Form JJJJ-MM-TT sein.',
    });
  });

  it('null in an optional field, an unknown field and a decorator-named sentence are keyed too', async () => {
    const { en, de } = await refused({ ...VALID, note: null, offset: -1, ...({ bogus: 1 } as object) });
    expect(en).toEqual({
      note: '"note" cannot be null; leave it out instead.',
      offset: 'offset cannot be negative.',
      bogus: '"bogus" is not a field this form accepts.',
    });
    expect(de).toEqual({
      note: '„note“ darf nicht null sein; lass es stattdessen weg.',
      offset: 'offset darf nicht negativ sein.',
      bogus: '„bogus“ ist kein Feld, das dieses Formular annimmt.',
    });
  });

  it('a DTO’s own sentence stays as the DTO wrote it', async () => {
    const { en, de } = await refused({ ...VALID, ownSentence: 1.5 });
    expect(en).toEqual({ ownSentence: 'The number of legs must be a whole number.' });
    expect(de).toEqual(en);
  });
});

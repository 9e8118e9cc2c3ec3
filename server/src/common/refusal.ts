import { wordsFor, type Catalogue, type FieldError } from '@broodsilk/shared';

/** A refusal's key below `refusal.` (`'sac.alreadyPulled'`), checked against the English catalogue; plural forms are picked by `count`. */
type Keys<T, P extends string = ''> = {
  [K in keyof T & string]: T[K] extends string ? `${P}${K extends `${infer B}_${'one' | 'other'}` ? B : K}` : Keys<T[K], `${P}${K}.`>;
}[keyof T & string];
export type RefusalKey = Keys<Catalogue['refusal']>;
export type RefusalValues = Record<string, string | number>;

/** What an exception carries: the English sentence, and its key and values so the filter can say it in the reader's language. */
export interface Refusal {
  message: string;
  key: string;
  values?: RefusalValues;
}

/** What `fieldError` takes: a refusal, or (explicitly, as `{ message }`) a sentence a shared rule wrote. */
export type Said = Pick<Refusal, 'message'> & Partial<Refusal>;

const english = wordsFor('en');

export function refusal(key: RefusalKey, values?: RefusalValues): Refusal {
  const path = `refusal.${key}`;
  return { message: english(path, values), key: path, ...(values ? { values } : {}) };
}

/** One field's refusal, for `details`. */
export function fieldRefusal(field: string, key: RefusalKey, values?: RefusalValues): FieldError {
  return { field, ...refusal(key, values) };
}

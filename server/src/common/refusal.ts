import { DEFAULT_LANGUAGE, serverWordsFor, type ServerCatalogue, type FieldError, type Language } from '@broodsilk/shared';

/** A refusal's key below `refusal.` (`'sac.alreadyPulled'`), checked against the English catalogue; plural forms are picked by `count`. */
type Keys<T, P extends string = ''> = {
  [K in keyof T & string]: T[K] extends string ? `${P}${K extends `${infer B}_${'one' | 'other'}` ? B : K}` : Keys<T[K], `${P}${K}.`>;
}[keyof T & string];
export type RefusalKey = Keys<ServerCatalogue['refusal']>;
export type RefusalValues = Record<string, string | number>;

/** What an exception carries: the English sentence, and its key and values so the filter can say it in the reader's language. */
export interface Refusal {
  message: string;
  key: string;
  values?: RefusalValues;
}

/** What `fieldError` takes: a refusal, or (explicitly, as `{ message }`) a sentence a shared rule wrote. */
export type Said = Pick<Refusal, 'message'> & Partial<Refusal>;

const TERM = /^\$t\(([^()]+)\)$/;
/** A value that is itself a catalogue word (a role, an end reason), said in the reader's language. */
export const term = (key: string): string => `$t(${key})`;

/** A keyed sentence in `lng`; values written with `term` are looked up first (only whole values, so typed text is never read as a key). */
export function say(lng: Language, key: string, values?: FieldError['values']): string {
  const t = serverWordsFor(lng);
  const said = values && Object.fromEntries(Object.entries(values).map(([k, v]) => [k, typeof v === 'string' && TERM.test(v) ? t(v.slice(3, -1)) : v]));
  return t(key, said);
}

/** What every 4xx throws: `throw new ConflictException(refusal('sac.alreadyPulled', { on }))`. */
export function refusal(key: RefusalKey, values?: RefusalValues): Refusal {
  return refusalFrom(`refusal.${key}`, values);
}

/** A refusal whose sentence another catalogue section already has (e.g. `text.alreadyEnded`). */
export function refusalFrom(path: string, values?: RefusalValues): Refusal {
  return { message: say(DEFAULT_LANGUAGE, path, values), key: path, ...(values ? { values } : {}) };
}

/** One field's refusal, for `details`. */
export function fieldRefusal(field: string, key: RefusalKey, values?: RefusalValues): FieldError {
  return { field, ...refusal(key, values) };
}

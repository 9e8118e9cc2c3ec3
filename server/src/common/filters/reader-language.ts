import { DEFAULT_LANGUAGE, LANGUAGES, isLanguage, type ApiErrorBody, type FieldError, type Language } from '@broodsilk/shared';
import type { Request } from 'express';
import { say } from '../refusal';

/** The reader's language from Accept-Language (Express's `accepts`, i.e. negotiator), English when none of ours is asked for. */
export function readerLanguage(req: Pick<Request, 'acceptsLanguages'>): Language {
  const best = req.acceptsLanguages(...LANGUAGES);
  return isLanguage(best) ? best : DEFAULT_LANGUAGE;
}

/** A sentence said in `lng` where it has a key; text without a key stays as written. */
function said<T extends { message: string; key?: string; values?: FieldError['values'] }>(x: T, lng: Language): Omit<T, 'key' | 'values'> {
  const { key, values, ...rest } = x;
  return key && lng !== DEFAULT_LANGUAGE ? { ...rest, message: say(lng, key, values) } : rest;
}

/**
 * The body as the reader gets it: its message and every field detail said in `lng`. The keys stay
 * on the server: the reader already has the words, and the wire shape stays `{ field, message }`.
 */
export function inReaderLanguage(body: ApiErrorBody, lng: Language): ApiErrorBody {
  const out = said(body, lng);
  return body.details ? { ...out, details: body.details.map((d) => said(d, lng)) } : out;
}

import type { i18n } from 'i18next';
import type { Widen } from './catalogue-shape.js';
import { en } from './en.js';
import { de } from './de.js';
import { mailDe, mailEn } from './mail.js';
import { remindersDe, remindersEn } from './reminders.js';
import { serverRefusalsDe, serverRefusalsEn } from './server-refusals.js';
import { createInstanceOn, wordsCache, type Language } from './words.js';

/**
 * The server's catalogue: the interface's words plus the sections only the server writes (the
 * e-mails, the reminders, the refusals of requests). Kept out of `en`/`de` so the client's bundle
 * does not carry them; nothing on the client imports this module.
 */
export const serverEn = /* @__PURE__ */ Object.assign({}, en, { mail: mailEn, reminders: remindersEn, refusal: serverRefusalsEn });
export type ServerCatalogue = Widen<typeof serverEn>;
export const serverDe: ServerCatalogue = /* @__PURE__ */ Object.assign({}, de, { mail: mailDe, reminders: remindersDe, refusal: serverRefusalsDe });

const SERVER_CATALOGUES: Readonly<Record<Language, ServerCatalogue>> = { en: serverEn, de: serverDe };

/** A separate, synchronously ready instance on the server's catalogue (see `createWords`). */
export function createServerWords(lng: Language, options: { fallback?: boolean } = {}): i18n {
  return createInstanceOn(SERVER_CATALOGUES, lng, options);
}

/** `Words` on the server's catalogue, fixed to one language and cached (one per reader's language). */
export const serverWordsFor = wordsCache(createServerWords);

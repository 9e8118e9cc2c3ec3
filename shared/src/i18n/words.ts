import i18next, { type i18n } from 'i18next';
import { en, type Catalogue } from './en.js';
import { de } from './de.js';

/** The interface languages; a later language only adds a catalogue here. */
export const LANGUAGES = ['en', 'de'] as const;
export type Language = (typeof LANGUAGES)[number];
export const DEFAULT_LANGUAGE: Language = 'en';

export const CATALOGUES: Readonly<Record<Language, Catalogue>> = { en, de };

/** i18next resources for every language (one namespace, `translation`). */
export const I18N_RESOURCES = Object.fromEntries(LANGUAGES.map((l) => [l, { translation: CATALOGUES[l] }]));

export function isLanguage(value: unknown): value is Language {
  return typeof value === 'string' && (LANGUAGES as readonly string[]).includes(value);
}

/** The first supported language among the browser's (`navigator.languages`), else English. */
export function languageFromTags(tags: readonly string[]): Language {
  for (const tag of tags) {
    const base = tag.toLowerCase().split('-')[0];
    if (isLanguage(base)) return base;
  }
  return DEFAULT_LANGUAGE;
}

/** Options every instance shares: plain text out (React and pdfkit escape), no key separators in values. */
export const I18N_OPTIONS = {
  resources: I18N_RESOURCES,
  fallbackLng: DEFAULT_LANGUAGE,
  interpolation: { escapeValue: false },
  returnNull: false,
} as const;

/** A separate, synchronously ready instance in one language over `catalogues` (one namespace, `translation`). */
export function createInstanceOn(catalogues: Readonly<Record<Language, object>>, lng: Language, options: { fallback?: boolean } = {}): i18n {
  const instance = i18next.createInstance();
  void instance.init({
    ...I18N_OPTIONS,
    resources: Object.fromEntries(LANGUAGES.map((l) => [l, { translation: catalogues[l] }])),
    lng,
    fallbackLng: options.fallback === false ? false : DEFAULT_LANGUAGE,
    initAsync: false,
  });
  return instance;
}

/** An instance on the interface's catalogue. */
export function createWords(lng: Language, options: { fallback?: boolean } = {}): i18n {
  return createInstanceOn(CATALOGUES, lng, options);
}

/** A `t` function with i18next's heavy key typing left out: a key and its values in, text out. */
export type Words = (key: string, values?: Record<string, unknown>) => string;

/** Wraps an i18next instance (or react-i18next's `i18n`) as `Words`. */
export const wordsOf =
  (instance: Pick<i18n, 't'>): Words =>
  (key, values) =>
    String(instance.t(key, values ?? {}));

/** `Words` fixed to one language, made by `create` on first use and kept (one per reader's language). */
export function wordsCache(create: (lng: Language) => i18n): (lng?: Language) => Words {
  const fixed = new Map<Language, Words>();
  return (lng = DEFAULT_LANGUAGE) => {
    let t = fixed.get(lng);
    if (!t) {
      t = wordsOf(create(lng));
      fixed.set(lng, t);
    }
    return t;
  };
}

/** `Words` on the interface's catalogue, fixed to one language. */
export const wordsFor = wordsCache(createWords);

/** Catalogue sections whose keys are one shared enum's values (string entries only). */
export type EnumSection = {
  [S in keyof Catalogue]: Catalogue[S] extends Record<string, string> ? S : never;
}[keyof Catalogue];

/**
 * The words for one enum value, e.g. `label(t, 'projectStage', 'sac-laid')`. Typed by the English
 * catalogue, so a value without words fails to compile.
 */
export function label<S extends EnumSection>(t: Words, section: S, value: keyof (typeof en)[S] & string, values?: Record<string, unknown>): string {
  return t(`${section}.${value}`, values);
}

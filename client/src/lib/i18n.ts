import i18next from 'i18next';
import { initReactI18next, useTranslation } from 'react-i18next';
import { useMemo } from 'react';
import { formatDate } from './dates';
import {
  I18N_OPTIONS,
  languageFromTags,
  wordsOf,
  type Catalogue,
  type EnumSection,
  type Language,
  type MaleClockState,
  type StageNumbering,
  type TemperatureUnit,
  type Words,
} from '@broodsilk/shared';

// One i18next instance with the shared catalogue; the browser's language until the user's setting arrives.
void i18next.use(initReactI18next).init({
  ...I18N_OPTIONS,
  lng: languageFromTags(typeof navigator === 'undefined' ? [] : navigator.languages),
  initAsync: false,
  react: { useSuspense: false },
});

export { i18next };

const CALENDAR_DATE = /^\d{4}-\d{2}-\d{2}$/;
/** Sentences carry calendar dates as ISO 8601 values; the reader sees them in the one date format of the interface. */
function readableValues(values: Parameters<Words>[1]): Parameters<Words>[1] {
  if (!values) return values;
  return Object.fromEntries(Object.entries(values).map(([k, v]) => [k, typeof v === 'string' && CALENDAR_DATE.test(v) ? formatDate(v) : v]));
}

/** Words of the current language, for code outside components (utilities, option lists built on render). */
export const words: Words = (key, values) => String(i18next.t(key, readableValues(values) ?? {}));

/** The reader's words in a component; re-renders when the language changes. */
export function useWords(): Words {
  const { i18n } = useTranslation();
  const lng = i18n.language;
  return useMemo(() => {
    // fixed to the language of this render, so a new language gives new words (and a re-render)
    const t = wordsOf({ t: i18n.getFixedT(lng) } as Pick<typeof i18n, 't'>);
    return ((key, values) => t(key, readableValues(values))) as Words;
  }, [i18n, lng]);
}

let numbering: StageNumbering = 'us';
/** The stage-numbering set of the signed-in user (settings); `us` before sign-in. */
export const currentNumbering = (): StageNumbering => numbering;
let unit: TemperatureUnit = 'C';
/** The signed-in user's temperature unit; °C before sign-in. */
export const currentUnit = (): TemperatureUnit => unit;
const applyNumbering = (n: StageNumbering, u: TemperatureUnit) => {
  numbering = n;
  unit = u;
};

/** Switches the interface to the user's language and numbering set (settings), once they are known. */
export function useReaderSettings(me: { language: Language; stageNumbering: StageNumbering; temperatureUnit: TemperatureUnit } | null | undefined): string {
  const { i18n } = useTranslation();
  if (me) applyNumbering(me.stageNumbering, me.temperatureUnit);
  if (me && i18n.language !== me.language) void i18n.changeLanguage(me.language);
  return `${i18n.language}-${numbering}-${unit}`;
}

/**
 * One catalogue section as a read-only map, `labels[value]` → the words in the current language.
 * Lets a screen keep its `LABELS[value]` lookups while the words come from the shared catalogue.
 */
export function catalogueLabels<S extends EnumSection>(section: S): Readonly<Record<keyof Catalogue[S] & string, string>> {
  return new Proxy({} as Record<string, string>, {
    get: (_target, key) => (typeof key === 'string' ? words(`${section}.${key}`) : undefined),
  }) as Readonly<Record<keyof Catalogue[S] & string, string>>;
}

/** The male clock's words per state (label and advice), in the current language. */
export const MALE_CLOCK_LABELS = new Proxy({} as Record<MaleClockState, { label: string; hint: string }>, {
  get: (_t, key: string) => ({ label: words(`maleClock.${key}.label`), hint: words(`maleClock.${key}.hint`) }),
});

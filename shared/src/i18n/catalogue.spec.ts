import { describe, expect, it } from 'vitest';
import { createWords, LANGUAGES, wordsOf, type Language } from './words.js';
import { en } from './en.js';
import { de } from './de.js';
import { ACTIVITY_KINDS, activityKindLabel, activitySentence } from './vocabulary.js';
import { shippingCautions } from './safety.js';
import { PROJECT_STAGE_LINE, type EndedEarlyReason, type ProjectSetback, type ProjectStage } from '../breeding/project-stage.js';
import { BROOD_STAGES, STAGE_NUMBERINGS } from '../breeding/brood-stage.js';
import type { PairingOutcome, SacFate, FailureClause } from '../breeding/pairing.types.js';
import type { PairingWarningCode, WarningSeverity } from '../breeding/pairing-warnings.js';
import type { PullWindowState } from '../breeding/pull-window.js';
import type { RollStatus } from '../breeding/roll-schedule.js';
import type { MaleClockState } from '../collection/male-clock.js';
import type { FemaleReadinessState } from '../collection/female-readiness.js';
import { ANIMAL_SEXES, ANIMAL_STATUSES, CUSTODIES, EXUVIA_SEXES, MATURITIES, OWNER_KINDS } from '../collection/animals.types.js';
import { SPECIES_GROUPS, VENOM_FLAGS } from '../collection/species.types.js';
import { SAC_FAILURE_REASONS, SAC_OUTCOMES, type PullWindowOrigin } from '../sacs/sacs.types.js';
import { BROOD_LOSS_REASONS } from '../sacs/brood.types.js';
import { CARE_LOG_KINDS } from '../sacs/care-log.types.js';
import { PROJECT_ROLES } from '../projects/project.types.js';
import { SHIPPING_PAYERS } from '../projects/terms.types.js';
import { TEMPERATURE_UNITS } from '../auth/auth.types.js';
import { NOTIFICATION_KINDS } from '../dashboard/notifications.types.js';
import type { PullWindowEvent } from '../dashboard/dashboard.types.js';
import type { EntryStatus, LedgerEntryResponse } from '../accounts/account-api.types.js';
import type { HandOverMethod } from '../accounts/ledger.types.js';

/** Lists every value of a type-only union: leaving one out fails to compile (`missing: 'the-value'`). */
const complete =
  <T extends string>() =>
  <const L extends readonly T[]>(list: L & ([Exclude<T, L[number]>] extends [never] ? unknown : { missing: Exclude<T, L[number]> })) =>
    list;

/** Every enum whose values reach a person, with the catalogue key that names them. */
const ENUMS: Record<string, readonly string[]> = {
  projectStage: complete<ProjectStage>()([...PROJECT_STAGE_LINE, 'ended-early']),
  endedEarly: complete<EndedEarlyReason>()(['no-sac', 'female-molted', 'sac-failed', 'sac-eaten', 'male-died']),
  sacOutcome: SAC_OUTCOMES,
  sacFate: complete<SacFate>()(['developing', 'failed', 'eaten']),
  sacFailure: SAC_FAILURE_REASONS,
  broodLoss: BROOD_LOSS_REASONS,
  pairingOutcome: complete<PairingOutcome>()(['connected', 'interest-only', 'female-refused', 'aggression', 'male-lost']),
  careLogKind: CARE_LOG_KINDS,
  pullWindow: complete<PullWindowState>()(['not-yet', 'open', 'closing', 'past']),
  pullWindowEvent: complete<PullWindowEvent>()(['opens-today', 'open', 'closes-today']),
  roll: complete<RollStatus>()(['upcoming', 'due-soon', 'due', 'overdue']),
  rollShort: complete<RollStatus>()(['upcoming', 'due-soon', 'due', 'overdue']),
  sex: ANIMAL_SEXES,
  maturity: MATURITIES,
  animalStatus: ANIMAL_STATUSES,
  custody: CUSTODIES,
  owner: OWNER_KINDS,
  exuvia: EXUVIA_SEXES,
  readiness: complete<FemaleReadinessState>()(['no-molt-recorded', 'hardening', 'ready', 'premolt']),
  severity: complete<WarningSeverity>()(['danger', 'warning', 'info']),
  role: PROJECT_ROLES,
  failureClause: complete<FailureClause>()(['nothing-owed', 'carries-over']),
  failureClauseText: complete<FailureClause>()(['nothing-owed', 'carries-over']),
  shippingPayer: SHIPPING_PAYERS,
  entryKind: complete<LedgerEntryResponse['kind']>()(['hand-over', 'arrival', 'sale', 'cash-out', 'money', 'correction', 'confirmation']),
  handOverMethod: complete<HandOverMethod>()(['pick-up', 'shipment']),
  entryStatus: complete<EntryStatus>()(['in-force', 'reversed', 'awaiting-confirmation', 'left-out']),
  notificationKind: NOTIFICATION_KINDS,
  'statementCsv.column': Object.keys(en.statementCsv.column),
  'statementCsv.line': Object.keys(en.statementCsv.line),
  setback: complete<ProjectSetback>()(['female-molted', 'sac-eaten', 'sac-failed', 'male-died']),
  temperatureUnit: TEMPERATURE_UNITS,
  language: LANGUAGES,
  activityKind: ACTIVITY_KINDS,
  'safety.groupCaution': SPECIES_GROUPS,
  'page.species.group': SPECIES_GROUPS,
  pullWindowOrigin: complete<PullWindowOrigin>()(['sac', 'species', 'default']),
  venom: VENOM_FLAGS,
  ...Object.fromEntries(STAGE_NUMBERINGS.map((n) => [`broodStage.${n}`, BROOD_STAGES])),
  maleClock: complete<MaleClockState>()(['fresh', 'prime', 'late', 'past-typical']),
};

/** A raw code shows through when the text is the code itself or contains a hyphenated code verbatim. */
function showsCode(text: string, code: string): boolean {
  return text === code || (code.includes('-') && text.includes(code)) || text.includes('{{') || text.startsWith(`${code}.`);
}

const strict = (lng: Language) => wordsOf(createWords(lng, { fallback: false }));

describe('the catalogue (i18next, en and de)', () => {
  for (const lng of LANGUAGES) {
    const t = strict(lng);
    it(`names every value of every shared enum in ${lng}, never with its code`, () => {
      const problems: string[] = [];
      for (const [section, values] of Object.entries(ENUMS)) {
        for (const value of values) {
          const key = section === 'maleClock' ? `${section}.${value}.label` : `${section}.${value}`;
          const text = t(key);
          if (!text || text === key || showsCode(text, value)) problems.push(`${key} → "${text}"`);
        }
      }
      expect(problems).toEqual([]);
    });

    it(`renders every pairing warning in ${lng} with its values filled in and the plural chosen`, () => {
      const codes: readonly PairingWarningCode[] = complete<PairingWarningCode>()([
        'female-molted-after-pairing',
        'male-fresh',
        'male-clock-late',
        'male-clock-past-typical',
        'no-pairing-male-late',
        'loan-overdue',
        'male-died-before-pairing',
        'male-died-after-pairing',
        'no-sac-after-a-year',
      ]);
      const values = {
        named: ' MO-042',
        molt: '2026-01-02',
        paired: '2025-12-01',
        days: 400,
        died: '2026-02-01',
        clause: 'X.',
        dueBack: '2026-01-01',
        endsOn: '2026-06-01',
      };
      for (const code of codes) {
        const one = t(`warning.${code}`, { ...values, count: 1 });
        const many = t(`warning.${code}`, { ...values, count: 5 });
        expect(one).not.toContain('{{');
        expect(one).not.toBe(`warning.${code}`);
        expect(showsCode(many, code)).toBe(false);
      }
    });
  }

  it('has the same keys in German as in English, so no page falls back to a key', () => {
    const keys = (o: object, at = ''): string[] =>
      Object.entries(o).flatMap(([k, v]) => (typeof v === 'string' ? [`${at}${k}`] : keys(v as object, `${at}${k}.`)));
    expect(keys(de).sort()).toEqual(keys(en).sort());
    const t = strict('de');
    const untranslated = keys(en).filter((k) => t(k) === k);
    expect(untranslated).toEqual([]);
  });

  it('picks the plural form by Intl.PluralRules: 1 day / 5 days, 1 Tag / 5 Tagen', () => {
    expect(strict('en')('warning.loan-overdue', { dueBack: 'D', count: 1 })).toMatch(/1 day ago/);
    expect(strict('en')('warning.loan-overdue', { dueBack: 'D', count: 5 })).toMatch(/5 days ago/);
    expect(strict('de')('warning.loan-overdue', { dueBack: 'D', count: 1 })).toMatch(/vor 1 Tag\./);
    expect(strict('de')('warning.loan-overdue', { dueBack: 'D', count: 5 })).toMatch(/vor 5 Tagen\./);
  });

  it("says a logged temperature again in the reader's unit and language, and a stage in their numbering", () => {
    const temp = { kind: 'care.temperature', summary: 'stored', data: { temperatureC: 25, layDate: '2026-01-01' } };
    // 25 °C = 77 °F (°F = °C × 9/5 + 32, NIST SP 811 appendix B)
    expect(activitySentence(strict('de'), temp, { unit: 'F', numbering: 'us' })).toBe('Temperatur 77.0 °F (Kokon vom 2026-01-01).');
    expect(activitySentence(strict('en'), temp, { unit: 'C', numbering: 'us' })).toBe('Temperature 25.0 °C (sac laid 2026-01-01).');
    const stage = { kind: 'care.stage', summary: 'stored', data: { stage: 'first-instar', layDate: '2026-01-01' } };
    expect(activitySentence(strict('de'), stage, { unit: 'C', numbering: 'de' })).toBe('Jetzt im Stadium N1 (1. Nymphe) (Kokon vom 2026-01-01).');
    expect(activitySentence(strict('en'), { kind: 'sac.laid', summary: 'stored', data: {} }, { unit: 'C', numbering: 'us' })).toBe('stored');
  });

  it('says a hand-over to-do to the one who confirms it: the recipient as "you", never by his own name', () => {
    for (const lng of LANGUAGES) {
      const t = strict(lng);
      const values = { party: 'Tomasz', date: '2026-11-20' };
      for (const count of [1, 5]) {
        const mine = t('page.account.todo.handOverMine', { ...values, count });
        expect(mine).not.toContain('Tomasz');
        expect(mine).not.toContain('{{');
        expect(mine).toMatch(lng === 'en' ? /you received/ : /du .* erhalten hast/);
        expect(t('page.account.todo.handOverFor', { ...values, count })).toMatch(lng === 'en' ? /that Tomasz received/ : /dass Tomasz .* erhalten hat/);
      }
    }
    // plural by Intl.PluralRules (CLDR): en and de both say one / other
    expect(strict('en')('page.account.todo.handOverMine', { date: 'D', count: 5 })).toMatch(/the 5 spiderlings/);
    expect(strict('de')('page.account.todo.handOverMine', { date: 'D', count: 1 })).toMatch(/das Jungtier erhalten hast, das dir/);
  });

  it('gives an unknown activity kind a plain word, never its code', () => {
    expect(activityKindLabel(strict('en'), 'pairing.recorded')).toBe('Pairing recorded');
    expect(activityKindLabel(strict('de'), 'made.up-kind')).toBe('Ereignis');
  });

  it('keeps every safety text deferring to the law in both languages', () => {
    for (const lng of LANGUAGES) {
      const t = strict(lng);
      expect(shippingCautions(t).at(-1)).toMatch(lng === 'en' ? /local law/ : /örtliches Recht/);
      for (const key of ['pairing', 'opening', 'openingHairs', 'openingNoHairs', 'sale', 'crossBorder', 'venom'])
        expect(t(`safety.${key}`)).toMatch(lng === 'en' ? /[Ll]ocal law/ : /[Öö]rtliche[sm]? Recht/);
    }
  });
});

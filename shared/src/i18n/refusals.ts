import type { Widen } from './catalogue-shape.js';

/**
 * What the shared rules say when they refuse a typed value or warn about an unusual one (section
 * `rule`): money fields, plausibility warnings (422 `details`), brood counts, withdrawals and the
 * ledger entries left out of the balances. Dates in values are ISO 8601; the client shows them in
 * the reader's format. `{{example, number(useGrouping: false)}}` writes a plain number in the
 * reader's decimal mark (i18next's Intl formatter).
 */
export const refusalsEn = {
  money: {
    required: 'Give an amount.',
    notNumber: 'Give the amount as a plain number, such as {{example, number(useGrouping: false)}}.',
    wholeOnly: '{{currency}} has no smaller unit; give a whole amount.',
    decimals_one: '{{currency}} has {{count}} decimal place; give at most {{count}}.',
    decimals_other: '{{currency}} has {{count}} decimal places; give at most {{count}}.',
    tooLarge: 'That amount is too large.',
  },
  /** Plausibility warnings, by their code (`PLAUSIBILITY_WARNINGS`); an opening's has four sentences. */
  warning: {
    'sac-without-pairing':
      'No successful pairing is recorded on or before {{layDate}}. Record the pairing first, or save the sac with a reason (e.g. paired before she came to you).',
    'sac-soon-after-pairing_one':
      'The sac would be laid {{count}} day after the last successful pairing ({{paired}}); this species usually needs at least {{minDays}} days. Check the dates.',
    'sac-soon-after-pairing_other':
      'The sac would be laid {{count}} days after the last successful pairing ({{paired}}); this species usually needs at least {{minDays}} days. Check the dates.',
    'sac-long-after-pairing':
      'The sac would be laid {{days}} days after the last successful pairing ({{paired}}), more than a year. Check the dates, or record a later pairing.',
    'pairing-before-male-matured':
      "The pairing ({{on}}) is dated before the male's maturing molt ({{matured}}); an immature male cannot pair. Check the dates.",
    'female-has-brood-in-progress':
      '{{female}} has a brood in progress in the open project "{{project}}". Finish or end that project first, or save with a reason.',
    'count-above-estimate': 'About {{previous}} were alive by the estimate on {{on}}; {{alive}} is more than that. Save it if the estimate was low.',
    'count-above-estimate-joined':
      'About {{previous}} were alive by the estimate on {{on}}, and {{joined}} kept-back young joined the brood since ({{ceiling}} in all); {{alive}} is more than that. Save it if the estimate was low.',
    eggsFewer: '{{total}} eggs and young is fewer than this species usually lays ({{min}}–{{max}} a sac). Check the count, or save it with a reason.',
    eggsFewerAbout:
      'About {{total}} eggs and young is fewer than this species usually lays ({{min}}–{{max}} a sac). Check the count, or save it with a reason.',
    eggsMore: '{{total}} eggs and young is more than this species usually lays ({{min}}–{{max}} a sac). Check the count, or save it with a reason.',
    eggsMoreAbout: 'About {{total}} eggs and young is more than this species usually lays ({{min}}–{{max}} a sac). Check the count, or save it with a reason.',
  },
  /** A count above the last exact count is refused. */
  count: {
    aboveLast:
      '{{previous}} were alive at the last count on {{on}}; {{alive}} is more than that. Young are not added between counts: correct the earlier count if it was wrong.',
    aboveLastJoined:
      '{{previous}} were alive at the last count on {{on}}, and {{joined}} kept-back young joined the brood since ({{ceiling}} in all); {{alive}} is more than that. Young are not added between counts: correct the earlier count if it was wrong.',
  },
  /** A sac's incubation band (`bandProblem`). */
  band: {
    temperatureOutside: 'A temperature band lies between {{lo}} and {{hi}} °C; {{value}} is outside.',
    humidityOutside: 'A humidity band lies between {{lo}} and {{hi}} %; {{value}} is outside.',
    temperatureUpsideDown: 'The lowest temperature ({{lo}} °C) must be below the highest ({{hi}} °C).',
    humidityUpsideDown: 'The lowest humidity ({{lo}} %) must be below the highest ({{hi}} %).',
  },
  /** A sac's own pull window (`pullWindowProblem`), in days after the lay date. */
  pullWindow: {
    wholeDays: 'Pull window days must be whole numbers (got day {{fromDay}} to day {{toDay}}).',
    beforeLaid: 'A pull window cannot open before the lay date (day 0); it opens on day {{fromDay}}.',
    closesBeforeOpens: 'A pull window must close on or after the day it opens (opens day {{fromDay}}, closes day {{toDay}}).',
  },
  withdrawal: {
    excess:
      'This is {{excess}} more than the {{available}} young still owed to this party (share {{share}}; {{handedOver}} handed over, {{sold}} sold, {{cashedOut}} cashed out).',
  },
  /** Why a stored ledger entry is left out of the balances (or kept with a doubt). */
  ledger: {
    duplicate: 'This entry appears twice; the later copy is ignored.',
    notEarlier: 'This correction refers to an entry that is not earlier than it.',
    alreadyCorrected: 'The entry this corrects was already corrected by another entry; this one is ignored.',
    noShare: 'This entry names a party with no share in the terms.',
    handOverCount: 'The count of this hand-over must be a whole number above 0.',
    arrivalWithoutHandOver: 'This arrival count refers to a hand-over that is not in force.',
    arrivalCounts: 'The counts of this arrival must be whole numbers, 0 or more.',
    arrivalTwice: 'That hand-over already has an arrival count; this one is ignored.',
    arrivalMismatch: 'This arrival counts {{counted}} young for a hand-over of {{count}}; it is kept, but check the counts.',
    saleNumbers: 'The count of this sale must be above 0 and its price a whole number of minor units.',
    otherCurrency: 'This entry is in {{currency}}, but the account is kept in {{accountCurrency}}.',
    cashOutNumbers: 'The count of this cash-out must be above 0 and its price a whole number of minor units.',
    ownerCashOut: 'The project owner cannot cash out to themselves.',
    paymentAmount: 'The amount of this payment must be a whole number of minor units above 0.',
    paymentToItself: 'This payment goes from a party to itself.',
  },
} as const;

export const refusalsDe: Widen<typeof refusalsEn> = {
  money: {
    required: 'Gib einen Betrag an.',
    notNumber: 'Gib den Betrag als einfache Zahl an, etwa {{example, number(useGrouping: false)}}.',
    wholeOnly: '{{currency}} hat keine kleinere Einheit; gib einen ganzen Betrag an.',
    decimals_one: '{{currency}} hat {{count}} Nachkommastelle; gib höchstens {{count}} an.',
    decimals_other: '{{currency}} hat {{count}} Nachkommastellen; gib höchstens {{count}} an.',
    tooLarge: 'Dieser Betrag ist zu groß.',
  },
  warning: {
    'sac-without-pairing':
      'Am oder vor dem {{layDate}} ist keine erfolgreiche Verpaarung eingetragen. Trag zuerst die Verpaarung ein oder speichere den Kokon mit einer Begründung (z. B. verpaart, bevor sie zu dir kam).',
    'sac-soon-after-pairing_one':
      'Der Kokon wäre {{count}} Tag nach der letzten erfolgreichen Verpaarung ({{paired}}) gebaut; diese Art braucht meist mindestens {{minDays}} Tage. Prüf die Daten.',
    'sac-soon-after-pairing_other':
      'Der Kokon wäre {{count}} Tage nach der letzten erfolgreichen Verpaarung ({{paired}}) gebaut; diese Art braucht meist mindestens {{minDays}} Tage. Prüf die Daten.',
    'sac-long-after-pairing':
      'Der Kokon wäre {{days}} Tage nach der letzten erfolgreichen Verpaarung ({{paired}}) gebaut, mehr als ein Jahr. Prüf die Daten oder trag eine spätere Verpaarung ein.',
    'pairing-before-male-matured':
      'Die Verpaarung ({{on}}) liegt vor der Reifehäutung des Männchens ({{matured}}); ein unreifes Männchen kann sich nicht verpaaren. Prüf die Daten.',
    'female-has-brood-in-progress':
      '{{female}} hat eine laufende Brut im offenen Projekt „{{project}}“. Schließ dieses Projekt ab oder beende es zuerst, oder speichere mit einer Begründung.',
    'count-above-estimate': 'Laut Schätzung vom {{on}} lebten etwa {{previous}}; {{alive}} sind mehr. Speichere trotzdem, wenn die Schätzung zu niedrig war.',
    'count-above-estimate-joined':
      'Laut Schätzung vom {{on}} lebten etwa {{previous}}, und seitdem kamen {{joined}} zurückbehaltene Jungtiere zur Brut ({{ceiling}} insgesamt); {{alive}} sind mehr. Speichere trotzdem, wenn die Schätzung zu niedrig war.',
    eggsFewer:
      '{{total}} Eier und Jungtiere sind weniger, als diese Art meist legt ({{min}}–{{max}} pro Kokon). Prüf die Zählung oder speichere mit einer Begründung.',
    eggsFewerAbout:
      'Etwa {{total}} Eier und Jungtiere sind weniger, als diese Art meist legt ({{min}}–{{max}} pro Kokon). Prüf die Zählung oder speichere mit einer Begründung.',
    eggsMore:
      '{{total}} Eier und Jungtiere sind mehr, als diese Art meist legt ({{min}}–{{max}} pro Kokon). Prüf die Zählung oder speichere mit einer Begründung.',
    eggsMoreAbout:
      'Etwa {{total}} Eier und Jungtiere sind mehr, als diese Art meist legt ({{min}}–{{max}} pro Kokon). Prüf die Zählung oder speichere mit einer Begründung.',
  },
  count: {
    aboveLast:
      'Bei der letzten Zählung am {{on}} lebten {{previous}}; {{alive}} sind mehr. Zwischen zwei Zählungen kommen keine Jungtiere hinzu: korrigiere die frühere Zählung, wenn sie falsch war.',
    aboveLastJoined:
      'Bei der letzten Zählung am {{on}} lebten {{previous}}, und seitdem kamen {{joined}} zurückbehaltene Jungtiere zur Brut ({{ceiling}} insgesamt); {{alive}} sind mehr. Zwischen zwei Zählungen kommen keine Jungtiere hinzu: korrigiere die frühere Zählung, wenn sie falsch war.',
  },
  band: {
    temperatureOutside: 'Ein Temperaturbereich liegt zwischen {{lo}} und {{hi}} °C; {{value}} liegt außerhalb.',
    humidityOutside: 'Ein Feuchtebereich liegt zwischen {{lo}} und {{hi}} %; {{value}} liegt außerhalb.',
    temperatureUpsideDown: 'Die niedrigste Temperatur ({{lo}} °C) muss unter der höchsten ({{hi}} °C) liegen.',
    humidityUpsideDown: 'Die niedrigste Feuchte ({{lo}} %) muss unter der höchsten ({{hi}} %) liegen.',
  },
  pullWindow: {
    wholeDays: 'Die Tage des Entnahmefensters müssen ganze Zahlen sein (angegeben: Tag {{fromDay}} bis Tag {{toDay}}).',
    beforeLaid: 'Ein Entnahmefenster kann nicht vor dem Legetag (Tag 0) öffnen; es öffnet an Tag {{fromDay}}.',
    closesBeforeOpens: 'Ein Entnahmefenster muss am Tag seiner Öffnung oder danach schließen (öffnet Tag {{fromDay}}, schließt Tag {{toDay}}).',
  },
  withdrawal: {
    excess:
      'Das sind {{excess}} mehr als die {{available}} Jungtiere, die diesem Beteiligten noch zustehen (Anteil {{share}}; {{handedOver}} übergeben, {{sold}} verkauft, {{cashedOut}} ausbezahlt).',
  },
  ledger: {
    duplicate: 'Dieser Eintrag steht doppelt da; die spätere Kopie zählt nicht.',
    notEarlier: 'Diese Korrektur bezieht sich auf einen Eintrag, der nicht vor ihr liegt.',
    alreadyCorrected: 'Der Eintrag, den dieser korrigiert, wurde schon durch einen anderen korrigiert; dieser zählt nicht.',
    noShare: 'Dieser Eintrag nennt einen Beteiligten ohne Anteil in den Bedingungen.',
    handOverCount: 'Die Anzahl dieser Übergabe muss eine ganze Zahl über 0 sein.',
    arrivalWithoutHandOver: 'Diese Ankunftszählung bezieht sich auf eine Übergabe, die nicht gilt.',
    arrivalCounts: 'Die Zahlen dieser Ankunft müssen ganze Zahlen ab 0 sein.',
    arrivalTwice: 'Diese Übergabe hat schon eine Ankunftszählung; diese zählt nicht.',
    arrivalMismatch: 'Diese Ankunft zählt {{counted}} Jungtiere für eine Übergabe von {{count}}; sie bleibt stehen, aber prüf die Zahlen.',
    saleNumbers: 'Die Anzahl dieses Verkaufs muss über 0 liegen und der Preis eine ganze Zahl in der kleinsten Währungseinheit sein.',
    otherCurrency: 'Dieser Eintrag ist in {{currency}}, das Konto wird aber in {{accountCurrency}} geführt.',
    cashOutNumbers: 'Die Anzahl dieser Auszahlung muss über 0 liegen und der Preis eine ganze Zahl in der kleinsten Währungseinheit sein.',
    ownerCashOut: 'Wer das Projekt führt, kann sich nicht selbst auszahlen.',
    paymentAmount: 'Der Betrag dieser Zahlung muss eine ganze Zahl in der kleinsten Währungseinheit über 0 sein.',
    paymentToItself: 'Diese Zahlung geht von einem Beteiligten an sich selbst.',
  },
};

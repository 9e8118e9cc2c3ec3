import type { Widen } from './catalogue-shape.js';

/**
 * How the shares of a sac were worked out, in plain words (shares page and statement), what changed
 * since the basis before, and the notes on a failed sac. Written by `explainShares` / `diffShares`
 * (shared/src/accounts/shares.ts) and the server's shares mapper in the reader's language.
 */
export const sharesEn = {
  young_one: '{{count}} young',
  young_other: '{{count}} young',
  counts: 'The sac counts {{young}}.',
  countsAbout: 'The sac counts about {{young}}.',
  party: '{{name}} {{count}}',
  fixedPartly: '{{name}} {{fixed}} of the {{asked}} agreed',
  fixedFirst: 'Fixed counts come first, in pick order: {{parts}}. {{rest}} remain.',
  fixedShort: 'There were not enough young to serve every fixed count in full; later picks got fewer.',
  nothingLeft: 'Nothing is left to split by weight.',
  quota: '{{name}} {{rest}} × {{weight}}/{{total}} = {{exact}} ≈ {{approx}}',
  /** The decimal mark of the rounded quotas. */
  decimalMark: '.',
  byWeight: 'The remaining {{young}} are split by weight: {{quotas}}.',
  noRounding: 'Every quota is a whole number, so no rounding was needed.',
  leftOver_one: 'Each party first gets the whole part of its quota; the {{count}} young still left goes to the largest remainder: {{names}}.',
  leftOver_other: 'Each party first gets the whole part of its quota; the {{count}} young still left go one each to the largest remainders: {{names}}.',
  tiedOut: 'Equal remainders went to the earlier pick.',
  inAll: 'In all: {{parts}}.',
  provisional: 'The count is an estimate, so these shares are provisional: they change with the first exact count, and cash-outs and settling wait for it.',
  countChanged: 'The count of young changed from {{before}} to {{after}}.',
  partyChanged: '{{name}}: {{before}} → {{after}} ({{change}}).',
  termsChanged: 'Terms version {{after}} came into force in place of version {{before}}.',
  noTerms: 'No version of the terms is in force yet, so there are no shares. Shares follow once every partner has accepted the terms.',
  noSac: 'This project has no sac yet; shares are worked out per sac from its count of young.',
  failed: {
    'nothing-owed':
      'This sac failed. The terms say nothing is owed for a failed sac: no party is owed young from it beyond what was already handed over, sold or cashed out.',
    'carries-over':
      'This sac failed. The terms say the deal carries over: the parties are owed their shares from the next sac instead, worked out on that sac’s count.',
  },
  failedNoTerms: 'This sac failed. No terms are in force, so nothing is owed from it.',
} as const;

export const sharesDe: Widen<typeof sharesEn> = {
  young_one: '{{count}} Jungtier',
  young_other: '{{count}} Jungtiere',
  counts: 'Gezählt im Kokon: {{young}}.',
  countsAbout: 'Gezählt im Kokon: etwa {{young}}.',
  party: '{{name}} {{count}}',
  fixedPartly: '{{name}} {{fixed}} von {{asked}} vereinbarten',
  fixedFirst: 'Feste Anzahlen kommen zuerst, in der Reihenfolge der Auswahl: {{parts}}. Für die Aufteilung nach Gewicht bleiben: {{rest}}.',
  fixedShort: 'Es gab nicht genug Jungtiere, um jede feste Anzahl voll zu bedienen; spätere in der Reihenfolge bekamen weniger.',
  nothingLeft: 'Nach Gewicht ist nichts mehr aufzuteilen.',
  quota: '{{name}} {{rest}} × {{weight}}/{{total}} = {{exact}} ≈ {{approx}}',
  decimalMark: ',',
  byWeight: 'Nach Gewicht aufgeteilt ({{young}}): {{quotas}}.',
  noRounding: 'Jede Quote ist eine ganze Zahl, es musste also nicht gerundet werden.',
  leftOver_one: 'Jeder Beteiligte bekommt zuerst den ganzzahligen Teil seiner Quote; das letzte übrige Jungtier geht an den größten Rest: {{names}}.',
  leftOver_other:
    'Jeder Beteiligte bekommt zuerst den ganzzahligen Teil seiner Quote; die {{count}} noch übrigen Jungtiere gehen einzeln an die größten Reste: {{names}}.',
  tiedOut: 'Bei gleichem Rest hatte die frühere Stelle in der Reihenfolge Vorrang.',
  inAll: 'Insgesamt: {{parts}}.',
  provisional:
    'Die Zahl ist geschätzt, deshalb sind diese Anteile vorläufig: Sie ändern sich mit der ersten genauen Zählung, und Auszahlungen und Abrechnung warten darauf.',
  countChanged: 'Die Zahl der Jungtiere hat sich von {{before}} auf {{after}} geändert.',
  partyChanged: '{{name}}: {{before}} → {{after}} ({{change}}).',
  termsChanged: 'Fassung {{after}} der Bedingungen gilt jetzt anstelle von Fassung {{before}}.',
  noTerms: 'Noch gilt keine Fassung der Bedingungen, deshalb gibt es keine Anteile. Die Anteile folgen, sobald jeder Partner die Bedingungen angenommen hat.',
  noSac: 'Dieses Projekt hat noch keinen Kokon; Anteile werden je Kokon aus seiner Zahl an Jungtieren berechnet.',
  failed: {
    'nothing-owed':
      'Dieser Kokon ist verdorben. Laut den Bedingungen ist für einen verdorbenen Kokon nichts geschuldet: Niemandem stehen daraus Jungtiere zu, außer denen, die schon übergeben, verkauft oder ausgezahlt wurden.',
    'carries-over':
      'Dieser Kokon ist verdorben. Laut den Bedingungen gilt die Abmachung für den nächsten Kokon weiter: Den Beteiligten stehen ihre Anteile stattdessen aus dem nächsten Kokon zu, berechnet nach dessen Zählung.',
  },
  failedNoTerms: 'Dieser Kokon ist verdorben. Es gelten keine Bedingungen, deshalb ist daraus nichts geschuldet.',
};

import type { Widen } from '../catalogue-shape.js';

/** Page text: project pages, pairings, terms, members (client/src/features/projects). English first; German must fill the same keys. */
export const projectsEn = {
  party: 'Party',
  terms: {
    loading: 'Loading the terms…',
    noneOwner: 'No terms yet. Propose how the brood is split below.',
    noneOther: 'No terms yet. The keeper has not proposed any.',
    version: 'Version {{number}}',
    inForce: 'In force',
    proposed: 'Proposed',
    by: 'by {{name}}, {{when}}',
    tableLabel: 'Parties of version {{number}}',
    picks: 'picks #{{order}}',
    takenFirstShort: ' · {{count}} first',
    share: 'Share',
    weight: '(weight {{weight}})',
    takenFirst: 'Taken first',
    picksHeader: 'Picks',
    accepted: 'Accepted',
    proposer: 'proposer',
    yes: 'yes',
    notYet: 'not yet',
    deal: '{{price}} per spiderling · {{clause}} · handed over at {{stage}} · shipping: {{shipping}}',
    waiting: 'Waiting for {{names}} to accept.',
    accept: 'Accept these terms',
    recordFor: 'Record {{name}}’s acceptance',
    recordConfirm: 'Record the acceptance',
    acceptConfirm: 'Yes, accept version {{number}}',
    recordedNote: 'Recorded by the keeper on their behalf.',
    youAgree:
      'You agree to version {{number}}: the split and prices shown above. When every partner has accepted, it replaces the terms in force. An acceptance cannot be withdrawn; a change needs a new version.',
    theyAgree:
      '{{name}} agrees to version {{number}}: the split and prices shown above. When every partner has accepted, it replaces the terms in force. An acceptance cannot be withdrawn; a change needs a new version.',
  },
} as const;

export const projectsDe: Widen<typeof projectsEn> = {
  party: 'Beteiligter',
  terms: {
    loading: 'Bedingungen werden geladen …',
    noneOwner: 'Noch keine Bedingungen. Schlage unten vor, wie die Brut aufgeteilt wird.',
    noneOther: 'Noch keine Bedingungen. Der Halter hat noch keine vorgeschlagen.',
    version: 'Fassung {{number}}',
    inForce: 'Gilt',
    proposed: 'Vorgeschlagen',
    by: 'von {{name}}, {{when}}',
    tableLabel: 'Beteiligte der Fassung {{number}}',
    picks: 'wählt als {{order}}.',
    takenFirstShort: ' · {{count}} vorab',
    share: 'Anteil',
    weight: '(Gewicht {{weight}})',
    takenFirst: 'Vorab',
    picksHeader: 'Wahl',
    accepted: 'Angenommen',
    proposer: 'schlägt vor',
    yes: 'ja',
    notYet: 'noch nicht',
    deal: '{{price}} je Jungtier · {{clause}} · Übergabe im Stadium {{stage}} · Versand: {{shipping}}',
    waiting: 'Wartet auf die Annahme durch {{names}}.',
    accept: 'Diese Bedingungen annehmen',
    recordFor: 'Annahme durch {{name}} erfassen',
    recordConfirm: 'Annahme erfassen',
    acceptConfirm: 'Ja, Fassung {{number}} annehmen',
    recordedNote: 'Vom Halter in seinem Namen erfasst.',
    youAgree:
      'Du stimmst Fassung {{number}} zu: der Aufteilung und den Preisen oben. Sobald jeder Partner angenommen hat, ersetzt sie die geltenden Bedingungen. Eine Annahme kann nicht zurückgenommen werden; eine Änderung braucht eine neue Fassung.',
    theyAgree:
      '{{name}} stimmt Fassung {{number}} zu: der Aufteilung und den Preisen oben. Sobald jeder Partner angenommen hat, ersetzt sie die geltenden Bedingungen. Eine Annahme kann nicht zurückgenommen werden; eine Änderung braucht eine neue Fassung.',
  },
};

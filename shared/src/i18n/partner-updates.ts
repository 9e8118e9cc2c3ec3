import type { Widen } from './catalogue-shape.js';

/**
 * Partner updates: what a partner reads (in-app and by e-mail) when the keeper or a caretaker
 * records something in a shared project, and the bad news with the keeper's own message.
 * Calendar dates stay ISO 8601 values (YYYY-MM-DD) as in every stored sentence.
 */
export const partnerUpdatesEn = {
  title: '{{project}}: {{what}}',
  recordedBy: 'Recorded by {{actor}}.',
  recordedBySystem: 'Recorded by Broodsilk.',
  sacLaid: 'A new sac was laid on {{layDate}}.',
  sacPulled: 'The sac laid {{layDate}} was pulled on {{pulledOn}} and is in the incubator now.',
  sacOpened: 'The sac laid {{layDate}} was opened: {{viable}} viable young.',
  sacOpenedEstimated: 'The sac laid {{layDate}} was opened: about {{viable}} viable young (an estimate).',
  broodCounted: '{{alive}} young alive at {{stage}} in the sac laid {{layDate}}.',
  broodCountedLost: '{{alive}} young alive at {{stage}} in the sac laid {{layDate}}; {{lost}} lost.',
  sacFailed: 'The sac laid {{layDate}} failed. Reason: {{reason}}.',
  projectEnded: 'The project ended early: {{reason}}.',
  maleDied: 'The male {{male}} died on {{on}}.',
  femaleMolted:
    'The female {{female}} molted on {{moltedOn}}, after the pairing on {{pairedOn}}. A molt sheds the stored sperm, so that pairing no longer counts; she has to be paired again.',
  handOver_one: '{{count}} young was handed over.',
  handOver_other: '{{count}} young were handed over.',
  termsProposed: 'Version {{number}} of the terms was proposed. Open the project to read it and accept it or ask for changes.',
  termsInForce: 'Version {{number}} of the terms is now in force.',
  countsOpening: 'At the opening: {{viable}} viable young, {{dark}} dark and {{spoiled}} spoiled eggs.',
  countsLatest: 'Last count: {{alive}} alive at {{stage}}.',
  countsNone: 'No count was recorded for this sac.',
  termsHeading: 'What the terms in force (version {{number}}) mean for each party:',
  clauseFor: {
    'nothing-owed': '{{name}} (weight {{weight}}): nothing is owed for this; the share ends here.',
    'carries-over': '{{name}} (weight {{weight}}): the share carries over to the next sac or pairing of this deal.',
  },
  messageFrom: 'A message from {{owner}}:',
  mailProgress: 'See how the project is going',
  mailWhy: 'You get this because you are a partner in “{{project}}” and partner updates are on in your settings.',
  mailWhyOutside: 'You get this because {{owner}} named you as a partner in “{{project}}” on Broodsilk. Reply to {{owner}} if you want no more of these.',
  mailUnsubscribe: 'Stop e-mails for partner updates',
} as const;

export const partnerUpdatesDe: Widen<typeof partnerUpdatesEn> = {
  title: '{{project}}: {{what}}',
  recordedBy: 'Eingetragen von {{actor}}.',
  recordedBySystem: 'Von Broodsilk eingetragen.',
  sacLaid: 'Am {{layDate}} wurde ein neuer Kokon gebaut.',
  sacPulled: 'Der Kokon vom {{layDate}} wurde am {{pulledOn}} entnommen und liegt jetzt im Inkubator.',
  sacOpened: 'Der Kokon vom {{layDate}} wurde geöffnet: {{viable}} lebensfähige Jungtiere.',
  sacOpenedEstimated: 'Der Kokon vom {{layDate}} wurde geöffnet: etwa {{viable}} lebensfähige Jungtiere (geschätzt).',
  broodCounted: '{{alive}} Jungtiere leben im Stadium {{stage}} (Kokon vom {{layDate}}).',
  broodCountedLost: '{{alive}} Jungtiere leben im Stadium {{stage}} (Kokon vom {{layDate}}); {{lost}} verloren.',
  sacFailed: 'Der Kokon vom {{layDate}} ist verdorben. Grund: {{reason}}.',
  projectEnded: 'Das Projekt wurde vorzeitig beendet: {{reason}}.',
  maleDied: 'Das Männchen {{male}} ist am {{on}} gestorben.',
  femaleMolted:
    'Das Weibchen {{female}} hat sich am {{moltedOn}} gehäutet, nach der Verpaarung am {{pairedOn}}. Mit der Häutung geht das gespeicherte Sperma verloren, diese Verpaarung zählt also nicht mehr; sie muss neu verpaart werden.',
  handOver_one: '{{count}} Jungtier wurde übergeben.',
  handOver_other: '{{count}} Jungtiere wurden übergeben.',
  termsProposed: 'Fassung {{number}} der Bedingungen wurde vorgeschlagen. Öffne das Projekt, um sie zu lesen und anzunehmen oder Änderungen zu erbitten.',
  termsInForce: 'Fassung {{number}} der Bedingungen gilt jetzt.',
  countsOpening: 'Bei der Öffnung: {{viable}} lebensfähige Jungtiere, {{dark}} dunkle und {{spoiled}} verdorbene Eier.',
  countsLatest: 'Letzte Zählung: {{alive}} lebend im Stadium {{stage}}.',
  countsNone: 'Für diesen Kokon wurde nichts gezählt.',
  termsHeading: 'Was die geltenden Bedingungen (Fassung {{number}}) für jeden Beteiligten bedeuten:',
  clauseFor: {
    'nothing-owed': '{{name}} (Gewicht {{weight}}): Dafür wird nichts geschuldet; der Anteil endet hier.',
    'carries-over': '{{name}} (Gewicht {{weight}}): Der Anteil gilt für den nächsten Kokon oder die nächste Verpaarung dieser Abmachung weiter.',
  },
  messageFrom: 'Eine Nachricht von {{owner}}:',
  mailProgress: 'Sieh dir den Stand des Projekts an',
  mailWhy: 'Du bekommst diese Nachricht, weil du Partner in „{{project}}“ bist und Partner-Neuigkeiten in deinen Einstellungen an sind.',
  mailWhyOutside:
    'Du bekommst diese Nachricht, weil {{owner}} dich in Broodsilk als Partner in „{{project}}“ eingetragen hat. Antworte {{owner}}, wenn du keine solchen Nachrichten mehr möchtest.',
  mailUnsubscribe: 'Keine E-Mails mehr zu Partner-Neuigkeiten',
};

import type { Widen } from '../catalogue-shape.js';

/** Page text: the data export card (client/src/features/export). English first; German must fill the same keys. */
export const exportDataEn = {
  title: 'Your data',
  text: 'One zip file with everything you keep here: your collection with its molts, feedings and photos, and for each project you belong to its pairings, sacs, care log, openings and counts, and the ledger entries your role lets you see. Each kind is a JSON file; dates are ISO 8601.',
  preparing: 'Preparing your data',
  received: '{{size}} received',
  stop: 'Stop',
  download: 'Download my data',
  saved: 'Saved {{name}} ({{size}}).',
  failed: 'The download did not finish',
  brokeOff: 'The download broke off. Check your connection and try again.',
  bytes_one: '{{count}} byte',
  bytes_other: '{{count}} bytes',
} as const;

export const exportDataDe: Widen<typeof exportDataEn> = {
  title: 'Deine Daten',
  text: 'Eine ZIP-Datei mit allem, was du hier führst: deine Sammlung mit Häutungen, Fütterungen und Fotos, und für jedes Projekt, an dem du beteiligt bist, seine Verpaarungen, Kokons, das Pflegeprotokoll, Öffnungen und Zählungen sowie die Buchungen, die deine Rolle sehen darf. Jede Art von Eintrag ist eine JSON-Datei; Daten stehen in ISO 8601.',
  preparing: 'Deine Daten werden vorbereitet',
  received: '{{size}} empfangen',
  stop: 'Abbrechen',
  download: 'Meine Daten herunterladen',
  saved: '{{name}} gespeichert ({{size}}).',
  failed: 'Der Download wurde nicht abgeschlossen',
  brokeOff: 'Der Download ist abgebrochen. Prüfe deine Verbindung und versuche es noch einmal.',
  bytes_one: '{{count}} Byte',
  bytes_other: '{{count}} Byte',
};

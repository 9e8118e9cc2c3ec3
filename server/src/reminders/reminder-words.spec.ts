import { describe, expect, it } from 'vitest';
import { DateTime } from 'luxon';
import { LANGUAGES, type Language } from '@broodsilk/shared';
import type { ReminderKind } from './planning/reminder-plan.types';
import { digestBody, reminderMailWords, reminderWords } from './reminder-words';
import type { ReminderReader } from './reminder-formats';

const ZONE = 'Europe/Berlin';
const ABOUT = 'K-7';
const LAY_DATE = '2026-02-10';
const reader = (language: Language, temperatureUnit: 'C' | 'F' = 'C'): ReminderReader => ({ timeZone: ZONE, language, temperatureUnit });

/** One example of each kind's details, as the planner writes them; a new kind fails to compile until it has one. */
const DETAILS: Record<ReminderKind, Record<string, string | number>> = {
  'roll-due': { due: '2026-03-14T08:30:00.000Z', intervalHours: 12 },
  'roll-overdue': { due: '2026-03-14T08:30:00.000Z', intervalHours: 12 },
  'pull-window-opens': { opensOn: '2026-03-14', closesOn: '2026-03-28' },
  'pull-window-closes': { closesOn: '2026-03-28' },
  'reading-out-of-band': { readAt: '2026-03-14T08:30:00.000Z', temperatureC: 24, humidityPercent: 78.5 },
  'male-clock': { state: 'late', from: '2026-03-14' },
  'female-molted': { moltedOn: '2026-03-14', pairedOn: '2026-01-20' },
  'loan-due-back': { dueBackOn: '2026-03-21' },
  'daily-digest': { date: '2026-03-14', summary: '' },
};
const KINDS = Object.keys(DETAILS) as ReminderKind[];

/** A kind's title and body for a reader, the digest's body written by `digestBody` as the delivery does. */
function render(kind: ReminderKind, r: ReminderReader): string {
  const details =
    kind === 'daily-digest' ? { ...DETAILS[kind], summary: digestBody(r, [{ at: new Date('2026-03-14T08:30:00Z'), title: 'T' }], 2) } : DETAILS[kind];
  const w = reminderWords(kind, details, { reader: r, about: ABOUT, layDate: LAY_DATE });
  const frame = reminderMailWords(r.language, kind);
  return [frame.subject(w.title), w.body, frame.open, frame.why, frame.unsubscribe].join('\n');
}

/** Finished words: no `{{value}}` left and no catalogue key path where a sentence should be. */
function expectFinished(text: string): void {
  expect(text).not.toMatch(/\{\{|\}\}/);
  expect(text).not.toMatch(/(?<![-\w])(reminders|maleClock|notificationKind)\.[\w-]/);
}

/** Spelt alike in both languages: "in", "die" (to die / the article), "E-Mails", the product's name. */
const SHARED_WORDS = ['in', 'die', 'mails', 'broodsilk'];

/** The words of an English text, without the values both languages share (the label, the zone, numbers). */
const englishWords = (text: string): string[] =>
  text
    .replaceAll(ABOUT, ' ')
    .replaceAll(ZONE, ' ')
    .toLowerCase()
    .split(/[^a-z’']+/)
    .filter((w) => w.length > 1 && !SHARED_WORDS.includes(w));

describe('reminder words in the reader’s language', () => {
  for (const lng of LANGUAGES) {
    it(`renders every reminder kind in ${lng} with its values filled in`, () => {
      for (const kind of KINDS) {
        const text = render(kind, reader(lng));
        expectFinished(text);
        if (kind !== 'daily-digest') expect(text, kind).toContain(ABOUT);
      }
    });
  }

  it('writes no English word into the German text of any kind', () => {
    for (const kind of KINDS) {
      const german = ` ${render(kind, reader('de')).toLowerCase()} `;
      const english = [...new Set([...englishWords(render(kind, reader('en'))), 'due', 'roll', 'sac', 'pull'])];
      const leftover = english.filter((w) => new RegExp(`[^a-zäöüß]${w}[^a-zäöüß]`).test(german));
      expect(leftover, kind).toEqual([]);
    }
  });

  it('shows instants in the reader’s zone and locale, naming the zone', () => {
    // 08:30 UTC on 14 March 2026 is 09:30 in Berlin: CET (UTC+1) until the last Sunday of March
    // (EU Directive 2000/84/EC), checked with luxon on the IANA tz database.
    const wall = DateTime.fromISO('2026-03-14T08:30:00Z').setZone(ZONE);
    expect(wall.toFormat('HH:mm')).toBe('09:30');
    // Unicode CLDR medium date + short time: en-GB "d MMM y, HH:mm", de "dd.MM.y, HH:mm".
    expect(reminderWords('roll-due', DETAILS['roll-due'], { reader: reader('en'), about: ABOUT, layDate: LAY_DATE }).body).toBe(
      'The sac laid 10 Feb 2026 is due for its next roll at 14 Mar 2026, 09:30 (Europe/Berlin) (every 12 hours).',
    );
    expect(reminderWords('roll-due', DETAILS['roll-due'], { reader: reader('de'), about: ABOUT, layDate: LAY_DATE }).body).toBe(
      'Der Kokon vom 10.02.2026 muss am 14.03.2026, 09:30 (Europe/Berlin) wieder gedreht werden (alle 12 Stunden).',
    );
  });

  it('names days in the reader’s language', () => {
    // 14 March 2026 is a Saturday (luxon's Gregorian weekday, 6 = Saturday); CLDR full dates:
    // en-GB "EEEE, d MMMM y", de "EEEE, d. MMMM y".
    expect(DateTime.fromISO('2026-03-14').weekday).toBe(6);
    const body = (lng: Language) => reminderWords('pull-window-closes', DETAILS['pull-window-closes'], { reader: reader(lng), about: ABOUT }).body;
    expect(body('en')).toContain('Saturday, 28 March 2026');
    expect(body('de')).toContain('Samstag, 28. März 2026');
    expect(DateTime.fromISO('2026-03-28').weekday).toBe(6);
  });

  it('picks the plural by Intl.PluralRules (CLDR: one / other in both languages)', () => {
    const roll = (lng: Language, intervalHours: number) =>
      reminderWords('roll-due', { ...DETAILS['roll-due'], intervalHours }, { reader: reader(lng), about: ABOUT, layDate: LAY_DATE }).body;
    expect(roll('en', 1)).toMatch(/\(every hour\)\.$/);
    expect(roll('de', 1)).toMatch(/\(jede Stunde\)\.$/);
    expect(digestBody(reader('de'), [], 1)).toBe('Für die nächsten 24 Stunden ist nichts geplant.\n1 ungelesene Nachricht in deinem Posteingang.');
    expect(digestBody(reader('de'), [], 0)).toMatch(/\n0 ungelesene Nachrichten in/);
    expect(digestBody(reader('en'), [], 0)).toBe('Nothing is planned for the next 24 hours.\n0 unread in your inbox.');
  });

  it('lists the digest’s plan soonest first, each at its instant in the reader’s zone', () => {
    const planned = [
      { at: new Date('2026-03-14T10:00:00Z'), title: 'B' },
      { at: new Date('2026-03-14T08:30:00Z'), title: 'A' },
    ];
    // CET is UTC+1 on 14 March 2026 (IANA tz database; see above).
    expect(digestBody(reader('en'), planned, 0)).toBe('14 Mar 2026, 09:30 (Europe/Berlin): A\n14 Mar 2026, 11:00 (Europe/Berlin): B\n0 unread in your inbox.');
  });

  it('gives a reading in the reader’s unit and decimal mark', () => {
    const body = (lng: Language, unit: 'C' | 'F') =>
      reminderWords('reading-out-of-band', DETAILS['reading-out-of-band'], { reader: reader(lng, unit), about: ABOUT, layDate: LAY_DATE }).body;
    // 24 °C = 75.2 °F (°F = °C × 9/5 + 32, NIST SP 811 appendix B); German writes a decimal comma (CLDR de).
    expect(body('en', 'F')).toContain('(75.2 °F, 78.5 %)');
    expect(body('de', 'C')).toContain('(24,0 °C, 78,5 %)');
    const humidityOnly = reminderWords(
      'reading-out-of-band',
      { ...DETAILS['reading-out-of-band'], temperatureC: '' },
      { reader: reader('en'), about: ABOUT, layDate: LAY_DATE },
    ).body;
    expect(humidityOnly).toContain('(78.5 %)');
  });
});

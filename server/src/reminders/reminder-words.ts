import type { ReminderKind } from './planning/reminder-plan.types';
import { NOTIFICATION_KIND_LABELS, wordsFor, type MaleClockState, type NotificationKind } from '@broodsilk/shared';

/**
 * The words of every reminder, in one place (to move to the message catalogue with the rest of
 * the interface's words). Times are shown in the recipient's zone, named, in a day-month-year order.
 */

export interface ReminderWords {
  title: string;
  body: string;
}

/** What a reminder is about, as the words need it. */
export interface WordsContext {
  timeZone: string;
  /** The project's title for a sac, the animal's label for an animal. */
  about: string;
  layDate?: string;
}

export function formatInstantIn(iso: string, timeZone: string): string {
  const text = new Intl.DateTimeFormat('en-GB', { timeZone, dateStyle: 'medium', timeStyle: 'short', hourCycle: 'h23' }).format(new Date(iso));
  return `${text} (${timeZone})`;
}

export function formatDay(date: string): string {
  return new Intl.DateTimeFormat('en-GB', { timeZone: 'UTC', weekday: 'long', day: 'numeric', month: 'long', year: 'numeric' }).format(
    new Date(`${date}T00:00:00Z`),
  );
}

type Details = Record<string, string | number>;

const WORDS: Record<ReminderKind, (d: Details, c: WordsContext) => ReminderWords> = {
  'roll-due': (d, c) => ({
    title: `Roll due: ${c.about}`,
    body: `The sac laid ${c.layDate} is due for its next roll at ${formatInstantIn(String(d.due), c.timeZone)} (every ${d.intervalHours} h).`,
  }),
  'roll-overdue': (d, c) => ({
    title: `Roll overdue: ${c.about}`,
    body: `The roll of the sac laid ${c.layDate} was due at ${formatInstantIn(String(d.due), c.timeZone)} and no roll is logged since. Roll it and log it.`,
  }),
  'pull-window-opens': (d, c) => ({
    title: `Pull window opens today: ${c.about}`,
    body: `The sac laid ${c.layDate} may be pulled from today, ${formatDay(String(d.opensOn))}, until ${formatDay(String(d.closesOn))}.`,
  }),
  'pull-window-closes': (d, c) => ({
    title: `Pull window closes in 2 days: ${c.about}`,
    body: `The last day to pull the sac laid ${c.layDate} is ${formatDay(String(d.closesOn))}.`,
  }),
  'reading-out-of-band': (d, c) => ({
    title: `Reading outside the target band: ${c.about}`,
    body: `The reading at ${formatInstantIn(String(d.readAt), c.timeZone)} (${d.temperatureC === '' ? '' : `${d.temperatureC} °C`}${d.humidityPercent === '' ? '' : ` ${d.humidityPercent} %`}) is outside the band set for the sac laid ${c.layDate}. Check the incubator and its heat source.`,
  }),
  'male-clock': (d, c) => {
    const key = d.state as Exclude<MaleClockState, 'fresh'>;
    const t = wordsFor('en');
    const state = { label: t(`maleClock.${key}.label`), hint: t(`maleClock.${key}.hint`) };
    return { title: `Male clock: ${c.about} — ${state.label}`, body: `From ${formatDay(String(d.from))}: ${state.hint}` };
  },
  'female-molted': (d, c) => ({
    title: `Molted after pairing: ${c.about}`,
    body: `${c.about} molted on ${formatDay(String(d.moltedOn))}, after her pairing on ${formatDay(String(d.pairedOn))}; a molt sheds the stored sperm, so that pairing no longer counts.`,
  }),
  'loan-due-back': (d, c) => ({
    title: `Due back in 7 days: ${c.about}`,
    body: `${c.about} is due back from the loan on ${formatDay(String(d.dueBackOn))}. Agree the journey with the other keeper and follow the rules for moving live animals where you both live.`,
  }),
  'daily-digest': (d) => ({ title: `Your day: ${formatDay(String(d.date))}`, body: String(d.summary ?? '') }),
};

export function reminderWords(kind: ReminderKind, details: Details, c: WordsContext): ReminderWords {
  return WORDS[kind](details, c);
}

export const MAIL_WORDS = {
  subjectPrefix: 'Broodsilk: ',
  open: 'Open in Broodsilk',
  why: (kind: NotificationKind) => `You get this because “${NOTIFICATION_KIND_LABELS[kind]}” is on in your reminder settings.`,
  unsubscribe: (kind: NotificationKind) => `Stop e-mails for “${NOTIFICATION_KIND_LABELS[kind]}”`,
  digestNothing: 'Nothing is planned for the next 24 hours.',
  digestUnread: (n: number) => `${n} unread in your inbox.`,
  unsubscribed: (kind: NotificationKind) =>
    `You will get no more e-mails for “${NOTIFICATION_KIND_LABELS[kind]}”. In-app reminders stay as they were; change either in your settings.`,
  unsubscribeConfirm: (kind: NotificationKind) => `Stop e-mails for “${NOTIFICATION_KIND_LABELS[kind]}”?`,
  unsubscribeButton: 'Stop these e-mails',
  badLink: 'This unsubscribe link is not valid (it may have been cut short or changed). Nothing was changed.',
} as const;

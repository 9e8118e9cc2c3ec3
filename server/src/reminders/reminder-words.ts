import { label, serverWordsFor, type Language, type NotificationKind, type Words } from '@broodsilk/shared';
import type { ReminderKind } from './planning/reminder-plan.types';
import { LOAN_NOTICE_DAYS, PULL_CLOSES_NOTICE_DAYS } from './planning/plan-reminders';
import { reminderFormats, type ReminderFormats, type ReminderReader } from './reminder-formats';

/**
 * The words of every reminder in its reader's language, from the catalogue's `reminders` section:
 * dates in the reader's locale, instants in their zone (named), temperatures in their unit.
 */

export interface ReminderWords {
  title: string;
  body: string;
}

/** What a reminder is about, as the words need it. */
export interface WordsContext {
  reader: ReminderReader;
  /** The project's title for a sac, the animal's label for an animal. */
  about: string;
  layDate?: string;
}

type Details = Record<string, string | number>;

const text = (v: string | number | undefined): string => String(v ?? '');

/** The reading's temperature and humidity, whichever it has (the planner passes '' for the other). */
function readingOf(d: Details, f: ReminderFormats): string {
  const parts = [d.temperatureC === '' ? null : f.temperature(Number(d.temperatureC)), d.humidityPercent === '' ? null : f.percent(Number(d.humidityPercent))];
  return parts.filter(Boolean).join(', ');
}

/** Each kind's values for its entry `reminders.<kind>` (its title and body take the same ones); `count` picks the plural. */
const VALUES: Record<ReminderKind, (d: Details, f: ReminderFormats, t: Words) => Record<string, string | number>> = {
  'roll-due': (d, f) => ({ due: f.instant(text(d.due)), count: Number(d.intervalHours) }),
  'roll-overdue': (d, f) => ({ due: f.instant(text(d.due)) }),
  'pull-window-opens': (d, f) => ({ opensOn: f.day(text(d.opensOn)), closesOn: f.day(text(d.closesOn)) }),
  'pull-window-closes': (d, f) => ({ closesOn: f.day(text(d.closesOn)), count: PULL_CLOSES_NOTICE_DAYS }),
  'reading-out-of-band': (d, f) => ({ readAt: f.instant(text(d.readAt)), reading: readingOf(d, f) }),
  'male-clock': (d, f, t) => ({ from: f.day(text(d.from)), state: t(`maleClock.${d.state}.label`), hint: t(`maleClock.${d.state}.hint`) }),
  'female-molted': (d, f) => ({ moltedOn: f.day(text(d.moltedOn)), pairedOn: f.day(text(d.pairedOn)) }),
  'loan-due-back': (d, f) => ({ dueBackOn: f.day(text(d.dueBackOn)), count: LOAN_NOTICE_DAYS }),
  'daily-digest': (d, f) => ({ date: f.day(text(d.date)) }),
};

export function reminderWords(kind: ReminderKind, details: Details, c: WordsContext): ReminderWords {
  const t = serverWordsFor(c.reader.language);
  const f = reminderFormats(c.reader);
  const values = { ...VALUES[kind](details, f, t), about: c.about, layDate: c.layDate ? f.date(c.layDate) : '' };
  // The digest's body is its summary, already written for the reader (digestBody).
  const body = kind === 'daily-digest' ? text(details.summary) : t(`reminders.${kind}.body`, values);
  return { title: t(`reminders.${kind}.title`, values), body };
}

/** The daily digest's body: what is planned (instant and title, soonest first), or that nothing is, then the unread count. */
export function digestBody(reader: ReminderReader, planned: { at: Date; title: string }[], unread: number): string {
  const t = serverWordsFor(reader.language);
  const f = reminderFormats(reader);
  const lines = [...planned]
    .sort((a, b) => a.at.getTime() - b.at.getTime())
    .map((p) => t('reminders.daily-digest.line', { at: f.instant(p.at), what: p.title }));
  return [...(lines.length ? lines : [t('reminders.daily-digest.nothing')]), t('reminders.daily-digest.unread', { count: unread })].join('\n');
}

/** The frame of a reminder e-mail: the subject, the link's label, why it came and how to stop it. */
export function reminderMailWords(lng: Language, kind: NotificationKind) {
  const t = serverWordsFor(lng);
  const name = label(t, 'notificationKind', kind);
  return {
    subject: (title: string) => t('mail.subject', { title }),
    open: t('mail.openInApp'),
    why: t('reminders.mail.why', { kind: name }),
    unsubscribe: t('reminders.mail.unsubscribe', { kind: name }),
  };
}

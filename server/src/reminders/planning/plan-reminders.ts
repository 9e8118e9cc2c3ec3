import { DEFAULT_REMINDER_CHANNEL, ROLL_OVERDUE_FRACTION, addDays, nextRollDue, pullWindowDates, rollingApplies, todayIn } from '@broodsilk/shared';
import { afterQuietHours, atLocalHour } from './local-time';
import type { AnimalFacts, PlannedReminder, Recipient, ReminderKind, SacFacts } from './reminder-plan.types';

/** Reminders about a day (a window opening, a loan due back) go out at this local hour. */
export const DAY_REMINDER_HOUR = 8;
/** Days before the pull window's close day that its closing is reminded. */
export const PULL_CLOSES_NOTICE_DAYS = 2;
/** Days before a loaned animal is due back that it is reminded. */
export const LOAN_NOTICE_DAYS = 7;
/** A reminder whose moment passed longer ago than this is no longer sent (after an outage, or for old records). */
export const STALE_AFTER_MS = 24 * 3_600_000;

const HOUR_MS = 3_600_000;

interface Fact {
  kind: ReminderKind;
  /** What makes it unique besides kind, subject and person (the due instant, the day, the reading). */
  id: string;
  at: Date;
  details: Record<string, string | number>;
}

function toReminder(r: Recipient, subject: PlannedReminder['subject'], projectId: string | null, f: Fact, now: Date): PlannedReminder | null {
  const channel = r.channels[f.kind] ?? DEFAULT_REMINDER_CHANNEL;
  if (channel === 'off' || now.getTime() - f.at.getTime() > STALE_AFTER_MS) return null;
  const breaksQuiet = f.kind === 'roll-overdue' && r.overdueBreaksQuiet;
  return {
    key: `${f.kind}:${subject?.id ?? 'day'}:${r.userId}:${f.id}`,
    kind: f.kind,
    userId: r.userId,
    subject,
    projectId,
    factAt: f.at,
    sendAt: breaksQuiet ? f.at : afterQuietHours(f.at, r.quietHours, r.timeZone),
    channel,
    details: f.details,
  };
}

function outsideBand(value: number | null, band: { min: number; max: number } | undefined): boolean {
  return value !== null && !!band && (value < band.min || value > band.max);
}

/** The facts of a sac worth a reminder for one person (the day-based ones fall on their local day). */
function sacFacts(s: SacFacts, r: Recipient): Fact[] {
  if (!s.active) return [];
  const out: Fact[] = [];
  if (!s.pulledAt && !s.leftWithMother) {
    const w = pullWindowDates(s.layDate, s.pullWindow);
    const warnOn = addDays(w.closesOn, -PULL_CLOSES_NOTICE_DAYS);
    out.push({
      kind: 'pull-window-opens',
      id: w.opensOn,
      at: atLocalHour(w.opensOn, DAY_REMINDER_HOUR, r.timeZone),
      details: { opensOn: w.opensOn, closesOn: w.closesOn },
    });
    out.push({ kind: 'pull-window-closes', id: w.closesOn, at: atLocalHour(warnOn, DAY_REMINDER_HOUR, r.timeZone), details: { closesOn: w.closesOn } });
  } else if (s.pulledAt && rollingApplies({ pulled: true, stage: s.stage, rollingOff: s.rollingOff, rollPastLegs: s.rollPastLegs })) {
    const due = nextRollDue({ pulledAt: s.pulledAt, lastRollAt: s.lastRollAt, intervalHours: s.rollIntervalHours });
    const overdueAt = new Date(due.getTime() + s.rollIntervalHours * HOUR_MS * ROLL_OVERDUE_FRACTION);
    const details = { due: due.toISOString(), intervalHours: s.rollIntervalHours };
    out.push({ kind: 'roll-due', id: due.toISOString(), at: due, details });
    out.push({ kind: 'roll-overdue', id: due.toISOString(), at: overdueAt, details });
  }
  const reading = s.latestReading;
  if (reading && s.band && (outsideBand(reading.temperatureC, s.band.temperatureC) || outsideBand(reading.humidityPercent, s.band.humidityPercent))) {
    out.push({
      kind: 'reading-out-of-band',
      id: reading.id,
      at: reading.at,
      details: { readAt: reading.at.toISOString(), temperatureC: reading.temperatureC ?? '', humidityPercent: reading.humidityPercent ?? '' },
    });
  }
  return out;
}

/**
 * Every reminder a sac's facts call for, per recipient, with its instant: the pure core of the
 * planning (no clock of its own: `now` only drops reminders gone stale). Re-planned whenever a fact
 * changes; what drops out of the plan is no longer true and is not sent.
 */
export function planSacReminders(s: SacFacts, now: Date): PlannedReminder[] {
  return s.recipients.flatMap((r) =>
    sacFacts(s, r)
      .map((f) => toReminder(r, { type: 'sac', id: s.id }, s.projectId, f, now))
      .filter((x): x is PlannedReminder => x !== null),
  );
}

/** The animal's reminders for its keeper: male clock changes, a loan due back, a molt after pairing. */
export function planAnimalReminders(a: AnimalFacts, now: Date): PlannedReminder[] {
  const r = a.keeper;
  const day = (date: string) => atLocalHour(date, DAY_REMINDER_HOUR, r.timeZone);
  const facts: Fact[] = a.maleClockChanges.map((c) => ({
    kind: 'male-clock',
    id: `${c.state}:${c.from}`,
    at: day(c.from),
    details: { state: c.state, from: c.from },
  }));
  if (a.dueBackOn) {
    facts.push({ kind: 'loan-due-back', id: a.dueBackOn, at: day(addDays(a.dueBackOn, -LOAN_NOTICE_DAYS)), details: { dueBackOn: a.dueBackOn } });
  }
  if (a.moltAfterPairing) {
    const m = a.moltAfterPairing;
    facts.push({ kind: 'female-molted', id: m.moltedOn, at: day(m.moltedOn), details: { moltedOn: m.moltedOn, pairedOn: m.pairedOn } });
  }
  return facts
    .map((f) => toReminder(r, { type: 'animal', id: a.id }, null, { ...f, details: { ...f.details, label: a.label } }, now))
    .filter((x): x is PlannedReminder => x !== null);
}

/** The next daily digest of a person who asked for one: at their hour, today if still ahead (strictly), else tomorrow. */
export function planDigest(r: Recipient, now: Date): PlannedReminder | null {
  if (r.digestHour === null) return null;
  const today = todayIn(r.timeZone, now);
  let date = today;
  let at = atLocalHour(date, r.digestHour, r.timeZone);
  if (at.getTime() <= now.getTime()) {
    date = addDays(today, 1);
    at = atLocalHour(date, r.digestHour, r.timeZone);
  }
  return toReminder(r, null, null, { kind: 'daily-digest', id: date, at, details: { date } }, now);
}

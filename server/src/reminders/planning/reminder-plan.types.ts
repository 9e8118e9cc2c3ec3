import type { BroodStage, Language, NotificationKind, PullWindow, ReminderChannel, TemperatureUnit } from '@broodsilk/shared';

/** A person a reminder may go to, with their choices. */
export interface Recipient {
  userId: string;
  email: string;
  timeZone: string;
  /** The words are written in this language, temperatures in this unit (their settings). */
  language: Language;
  temperatureUnit: TemperatureUnit;
  channels: Partial<Record<NotificationKind, ReminderChannel>>;
  quietHours: { from: number; to: number } | null;
  overdueBreaksQuiet: boolean;
  digestHour: number | null;
}

export interface Reading {
  id: string;
  at: Date;
  temperatureC: number | null;
  humidityPercent: number | null;
}

/** Target band for a sac's readings (both ends inclusive): the sac's own, else the default band. */
export interface ReadingBand {
  temperatureC?: { min: number; max: number };
  humidityPercent?: { min: number; max: number };
}

/** What the planner knows of one sac. */
export interface SacFacts {
  id: string;
  projectId: string;
  projectTitle: string;
  /** In progress in an open project: only then is anything reminded. */
  active: boolean;
  layDate: string;
  pullWindow: PullWindow;
  pulledAt: Date | null;
  rollIntervalHours: number;
  rollingOff: boolean;
  /** The keeper keeps rolling past eggs with legs (to first instar). */
  rollPastLegs: boolean;
  /** Left with the mother on purpose: no pull-window reminders. */
  leftWithMother: boolean;
  stage: BroodStage;
  lastRollAt: Date | null;
  latestReading: Reading | null;
  band: ReadingBand | null;
  /** The owner and each caretaker with an account. */
  recipients: Recipient[];
}

/** What the planner knows of one animal, for its keeper. */
export interface AnimalFacts {
  id: string;
  label: string;
  keeper: Recipient;
  /** Dates the male clock moves to a later state (`prime`, `late`, `past-typical`); empty for others. */
  maleClockChanges: { state: 'prime' | 'late' | 'past-typical'; from: string }[];
  /** Due back from a loan on this day, while out on loan. */
  dueBackOn: string | null;
  /** Her last molt came after her last pairing (the pairing's sperm is shed with the molt). */
  moltAfterPairing: { moltedOn: string; pairedOn: string } | null;
}

/** What the planner plans: every notification kind but partner updates (written from activity events). */
export type ReminderKind = Exclude<NotificationKind, 'partner-update'>;

/** One reminder for one person: the fact it tells, when it goes out, and how. */
export interface PlannedReminder {
  /** Same reminder, same key: `reminder_sent` holds it once sent. */
  key: string;
  kind: ReminderKind;
  userId: string;
  subject: { type: 'sac' | 'animal'; id: string } | null;
  projectId: string | null;
  /** The moment the fact happens (a roll falls due, a window opens). */
  factAt: Date;
  /** When it goes out: `factAt`, or the end of the recipient's quiet hours. */
  sendAt: Date;
  channel: Exclude<ReminderChannel, 'off'>;
  /** What the words need, as plain values (times as ISO instants; the template shows them in the recipient's zone). */
  details: Record<string, string | number>;
}

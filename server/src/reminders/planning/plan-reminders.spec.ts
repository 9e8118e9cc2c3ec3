import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { planAnimalReminders, planDigest, planSacReminders } from './plan-reminders';
import type { PlannedReminder, Recipient, SacFacts } from './reminder-plan.types';

const keeper: Recipient = {
  userId: 'u-keeper',
  email: 'keeper@example.test',
  timeZone: 'Europe/Berlin',
  language: 'en',
  temperatureUnit: 'C',
  channels: {},
  quietHours: null,
  overdueBreaksQuiet: false,
  digestHour: null,
};
const helper: Recipient = { ...keeper, userId: 'u-helper', email: 'helper@example.test', timeZone: 'America/New_York' };

function sac(over: Partial<SacFacts> = {}): SacFacts {
  return {
    id: 'sac-1',
    projectId: 'p-1',
    projectTitle: 'Spring pair',
    active: true,
    layDate: '2026-02-20',
    pullWindow: { fromDay: 37, toDay: 45 },
    pulledAt: null,
    rollIntervalHours: 12,
    rollingOff: false,
    rollPastLegs: false,
    leftWithMother: false,
    stage: 'eggs',
    lastRollAt: null,
    latestReading: null,
    band: null,
    recipients: [keeper],
    ...over,
  };
}

/** Berlin wall time of an instant, read back with the platform's Intl (the IANA tz database), the reference for every zone check here. */
const berlin = (d: Date) => new Intl.DateTimeFormat('en-GB', { timeZone: 'Europe/Berlin', dateStyle: 'short', timeStyle: 'short', hourCycle: 'h23' }).format(d);
const newYork = (d: Date) =>
  new Intl.DateTimeFormat('en-GB', { timeZone: 'America/New_York', dateStyle: 'short', timeStyle: 'short', hourCycle: 'h23' }).format(d);
const byKind = (plan: PlannedReminder[], kind: string) => plan.filter((r) => r.kind === kind);

beforeEach(() => vi.useFakeTimers());
afterEach(() => vi.useRealTimers());

describe('pull window reminders in the recipient’s zone, across the daylight-saving change', () => {
  // tz database (europe file, rule EU): Berlin moves from CET (+01) to CEST (+02) on the last
  // Sunday of March, 2026-03-29 at 01:00 UTC; New York (rule US) on 2026-03-08 at 07:00 UTC.
  it('the window opening on 2026-03-29 (day 37) is reminded at 08:00 Berlin summer time, i.e. 06:00 UTC', () => {
    vi.setSystemTime(new Date('2026-03-20T12:00:00Z'));
    const [opens] = byKind(planSacReminders(sac(), new Date()), 'pull-window-opens');
    expect(opens.sendAt.toISOString()).toBe('2026-03-29T06:00:00.000Z');
    expect(berlin(opens.sendAt)).toBe('29/03/2026, 08:00');
  });

  it('the same window a day earlier (2026-03-28, still winter time) is reminded at 07:00 UTC: the local hour holds, the UTC hour moves', () => {
    vi.setSystemTime(new Date('2026-03-20T12:00:00Z'));
    const [opens] = byKind(planSacReminders(sac({ layDate: '2026-02-19' }), new Date()), 'pull-window-opens');
    expect(opens.sendAt.toISOString()).toBe('2026-03-28T07:00:00.000Z');
    expect(berlin(opens.sendAt)).toBe('28/03/2026, 08:00');
  });

  it('closing is reminded 2 days before the close day, and each recipient gets it at 08:00 of their own zone', () => {
    vi.setSystemTime(new Date('2026-03-20T12:00:00Z'));
    const plan = byKind(planSacReminders(sac({ recipients: [keeper, helper] }), new Date()), 'pull-window-closes');
    expect(plan.map((r) => [r.userId, berlin(r.sendAt), newYork(r.sendAt)])).toEqual([
      ['u-keeper', '04/04/2026, 08:00', '04/04/2026, 02:00'],
      ['u-helper', '04/04/2026, 14:00', '04/04/2026, 08:00'],
    ]);
    expect(new Set(plan.map((r) => r.key)).size).toBe(2);
  });

  it('a sac left with the mother on purpose gets no pull-window reminders', () => {
    vi.setSystemTime(new Date('2026-03-20T12:00:00Z'));
    expect(planSacReminders(sac({ leftWithMother: true }), new Date()).filter((r) => r.kind.startsWith('pull-window'))).toEqual([]);
  });

  it('once the pull is recorded, no window reminder remains', () => {
    vi.setSystemTime(new Date('2026-03-30T12:00:00Z'));
    const plan = planSacReminders(sac({ pulledAt: new Date('2026-03-30T10:00:00Z') }), new Date());
    expect(plan.filter((r) => r.kind.startsWith('pull-window'))).toEqual([]);
  });
});

/**
 * A fake clock walks through an incubation in 15-minute steps; at each step the plan is made
 * afresh from the facts, and what is due and not yet sent is "sent" (its key remembered), as the
 * job handler does. The keeper logs each roll `lateBy` after it falls due.
 */
function walk(facts: SacFacts, from: Date, to: Date, lateByMs: number | null): PlannedReminder[] {
  vi.setSystemTime(from);
  const sent = new Map<string, PlannedReminder>();
  let f = facts;
  while (Date.now() <= to.getTime()) {
    const now = new Date();
    for (const r of planSacReminders(f, now)) if (r.sendAt <= now && !sent.has(r.key)) sent.set(r.key, r);
    const due = byKind(planSacReminders(f, now), 'roll-due')[0];
    if (lateByMs !== null && due && now.getTime() >= due.factAt.getTime() + lateByMs) f = { ...f, lastRollAt: now };
    vi.advanceTimersByTime(15 * 60_000);
  }
  return [...sent.values()];
}

describe('rolls', () => {
  const pulledAt = new Date('2026-03-27T20:00:00Z');
  const pulled = (over: Partial<SacFacts> = {}) => sac({ pulledAt, ...over });

  it('every roll of a 3-day incubation at a 12 h interval is reminded once, at its due instant (6 rolls), across the DST change', () => {
    const sent = walk(pulled(), pulledAt, new Date(pulledAt.getTime() + 71.5 * 3_600_000), 30 * 60_000);
    const rolls = byKind(sent, 'roll-due');
    expect(rolls).toHaveLength(6);
    // Elapsed time rules the schedule (roll-schedule.ts): each due is 12 h + 30 min after the last one, so the
    // Berlin wall time jumps by an hour across 2026-03-29 01:00 UTC while the UTC spacing stays the same.
    expect(rolls.map((r) => r.factAt.toISOString())).toEqual([
      '2026-03-27T20:00:00.000Z',
      '2026-03-28T08:30:00.000Z',
      '2026-03-28T21:00:00.000Z',
      '2026-03-29T09:30:00.000Z',
      '2026-03-29T22:00:00.000Z',
      '2026-03-30T10:30:00.000Z',
    ]);
    expect(berlin(rolls[2].factAt)).toBe('28/03/2026, 22:00');
    expect(berlin(rolls[3].factAt)).toBe('29/03/2026, 11:30');
    expect(rolls.every((r) => r.sendAt.getTime() === r.factAt.getTime())).toBe(true);
    expect(byKind(sent, 'roll-overdue')).toEqual([]); // rolled within the quarter interval each time
  });

  it('a roll not logged is overdue once, a quarter of the interval after it fell due (3 h for 12 h), and not again', () => {
    const sent = walk(pulled(), pulledAt, new Date(pulledAt.getTime() + 20 * 3_600_000), null);
    expect(byKind(sent, 'roll-due').map((r) => r.factAt.toISOString())).toEqual(['2026-03-27T20:00:00.000Z']);
    expect(byKind(sent, 'roll-overdue').map((r) => r.sendAt.toISOString())).toEqual(['2026-03-27T23:00:00.000Z']);
  });

  it('a roll logged early replaces the due roll: the old due and its overdue leave the plan', () => {
    vi.setSystemTime(new Date('2026-03-28T07:00:00Z'));
    const before = planSacReminders(pulled({ lastRollAt: new Date('2026-03-27T20:00:00Z') }), new Date());
    const after = planSacReminders(pulled({ lastRollAt: new Date('2026-03-28T06:30:00Z') }), new Date());
    expect(byKind(before, 'roll-due')[0].factAt.toISOString()).toBe('2026-03-28T08:00:00.000Z');
    expect(byKind(after, 'roll-due')[0].factAt.toISOString()).toBe('2026-03-28T18:30:00.000Z');
    const afterKeys = new Set(after.map((r) => r.key));
    expect(before.filter((r) => afterKeys.has(r.key))).toEqual([]);
  });

  it('the owner and each caretaker get each roll, with keys of their own', () => {
    vi.setSystemTime(pulledAt);
    const rolls = byKind(planSacReminders(pulled({ recipients: [keeper, helper] }), new Date()), 'roll-due');
    expect(rolls.map((r) => r.userId)).toEqual(['u-keeper', 'u-helper']);
    expect(rolls[0].key).not.toBe(rolls[1].key);
  });

  it('no roll is reminded once the legs have formed, rolling is off, or the sac is over', () => {
    vi.setSystemTime(pulledAt);
    // docs/trade-facts.md §4: rolling stops once the eggs have legs (docs/rules.md, Rolls)
    for (const over of [{ stage: 'eggs-with-legs' as const }, { stage: 'first-instar' as const }, { rollingOff: true }, { active: false }]) {
      expect(planSacReminders(pulled(over), new Date()).filter((r) => r.kind.startsWith('roll'))).toEqual([]);
    }
  });

  it('a sac the keeper keeps rolling past the legs is reminded at eggs with legs, and not at first instar', () => {
    vi.setSystemTime(pulledAt);
    const rolls = (over: Partial<SacFacts>) => byKind(planSacReminders(pulled({ rollPastLegs: true, ...over }), new Date()), 'roll-due');
    expect(rolls({ stage: 'eggs-with-legs' })).toHaveLength(1);
    expect(rolls({ stage: 'first-instar' })).toEqual([]);
  });
});

describe('quiet hours and channels', () => {
  const pulledAt = new Date('2026-03-27T22:00:00Z'); // 23:00 in Berlin (CET)
  const quiet: Recipient = { ...keeper, quietHours: { from: 22, to: 7 } };

  it('a roll due at 23:00 local waits for the end of the quiet hours (07:00 local); none goes out inside them', () => {
    vi.setSystemTime(pulledAt);
    const plan = planSacReminders(sac({ pulledAt, recipients: [quiet] }), new Date());
    expect(plan.map((r) => [r.kind, berlin(r.sendAt)])).toEqual([
      ['roll-due', '28/03/2026, 07:00'],
      ['roll-overdue', '28/03/2026, 07:00'],
    ]);
  });

  it('roll-overdue breaks the quiet hours when the user allows it', () => {
    vi.setSystemTime(pulledAt);
    const plan = planSacReminders(sac({ pulledAt, recipients: [{ ...quiet, overdueBreaksQuiet: true }] }), new Date());
    expect(plan.map((r) => [r.kind, berlin(r.sendAt)])).toEqual([
      ['roll-due', '28/03/2026, 07:00'],
      ['roll-overdue', '28/03/2026, 02:00'],
    ]);
  });

  it('quiet hours within one day (13–15) hold a reminder at 14:00 until 15:00', () => {
    vi.setSystemTime(new Date('2026-03-20T00:00:00Z'));
    const at = new Date('2026-03-27T13:00:00Z'); // 14:00 CET
    const [due] = planSacReminders(sac({ pulledAt: at, recipients: [{ ...keeper, quietHours: { from: 13, to: 15 } }] }), new Date());
    expect(berlin(due.sendAt)).toBe('27/03/2026, 15:00');
  });

  it('a kind turned off is not planned; the others keep their channel', () => {
    vi.setSystemTime(pulledAt);
    const plan = planSacReminders(sac({ pulledAt, recipients: [{ ...keeper, channels: { 'roll-due': 'off', 'roll-overdue': 'email' } }] }), new Date());
    expect(plan.map((r) => [r.kind, r.channel])).toEqual([['roll-overdue', 'email']]);
  });
});

describe('readings, animals and the digest', () => {
  it('a reading outside the target band is reminded at once; one inside it is not', () => {
    vi.setSystemTime(new Date('2026-03-28T10:00:00Z'));
    const reading = { id: 'r-1', at: new Date('2026-03-28T09:55:00Z'), temperatureC: 31, humidityPercent: 70 };
    const band = { temperatureC: { min: 22, max: 28 } };
    expect(byKind(planSacReminders(sac({ latestReading: reading, band }), new Date()), 'reading-out-of-band').map((r) => r.sendAt)).toEqual([reading.at]);
    expect(byKind(planSacReminders(sac({ latestReading: { ...reading, temperatureC: 26 }, band }), new Date()), 'reading-out-of-band')).toEqual([]);
  });

  it('male clock changes, a loan due back in 7 days and a molt after pairing go to the keeper at 08:00 local', () => {
    vi.setSystemTime(new Date('2026-03-20T00:00:00Z'));
    const plan = planAnimalReminders(
      {
        id: 'a-1',
        label: 'M-07',
        keeper,
        maleClockChanges: [{ state: 'prime', from: '2026-03-30' }],
        dueBackOn: '2026-04-06',
        moltAfterPairing: { moltedOn: '2026-03-21', pairedOn: '2026-02-01' },
      },
      new Date(),
    );
    expect(plan.map((r) => [r.kind, berlin(r.sendAt)])).toEqual([
      ['male-clock', '30/03/2026, 08:00'],
      ['loan-due-back', '30/03/2026, 08:00'],
      ['female-molted', '21/03/2026, 08:00'],
    ]);
  });

  it('what happened more than a day ago is not planned any more (an old record, a long outage)', () => {
    vi.setSystemTime(new Date('2026-04-20T00:00:00Z'));
    expect(planSacReminders(sac(), new Date())).toEqual([]);
  });

  it('the digest comes at the chosen local hour: today while ahead, else tomorrow', () => {
    vi.setSystemTime(new Date('2026-03-28T05:00:00Z')); // 06:00 in Berlin
    const r = { ...keeper, digestHour: 7 };
    expect(berlin(planDigest(r, new Date())!.sendAt)).toBe('28/03/2026, 07:00');
    vi.setSystemTime(new Date('2026-03-28T07:00:00Z'));
    expect(berlin(planDigest(r, new Date())!.sendAt)).toBe('29/03/2026, 07:00'); // summer time by then: 05:00 UTC
    expect(planDigest(r, new Date())!.sendAt.toISOString()).toBe('2026-03-29T05:00:00.000Z');
    expect(planDigest(keeper, new Date())).toBeNull();
  });
});

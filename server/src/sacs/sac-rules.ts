import { LOG_FUTURE_TOLERANCE_MS, assertPullWindow, todayIn } from '@broodsilk/shared';
import { fieldError } from '../common/field-errors';

/** An instant may be up to a minute ahead of the server's clock (phones and servers disagree a little). */
export function assertNotFuture(field: string, what: string, at: Date, now: Date): void {
  if (at.getTime() > now.getTime() + LOG_FUTURE_TOLERANCE_MS) {
    throw fieldError(field, `The ${what} ${at.toISOString()} is in the future; record it when it has happened.`);
  }
}

export interface SacDates {
  layDate: string;
  pulledAt: Date | null;
  pullFromDay: number | null;
  pullToDay: number | null;
}

/** Checks a sac's dates and window together, as they will be stored; `timeZone` is the recorder's. */
export function assertSacDates(s: SacDates, timeZone: string, now: Date): void {
  const today = todayIn(timeZone, now);
  if (s.layDate > today) throw fieldError('layDate', `The lay date ${s.layDate} is after today (${today} where you are); a sac is recorded once it is laid.`);
  if (s.pulledAt) {
    assertNotFuture('pulledAt', 'pull time', s.pulledAt, now);
    const pulledOn = todayIn(timeZone, s.pulledAt);
    if (pulledOn < s.layDate) throw fieldError('pulledAt', `The sac cannot be pulled (${pulledOn}) before it was laid (${s.layDate}).`);
  }
  if ((s.pullFromDay == null) !== (s.pullToDay == null)) {
    throw fieldError(s.pullFromDay == null ? 'pullFromDay' : 'pullToDay', 'Give both the first and the last pull day, or neither to use the species window.');
  }
  if (s.pullFromDay != null && s.pullToDay != null) {
    try {
      assertPullWindow({ fromDay: s.pullFromDay, toDay: s.pullToDay });
    } catch (e) {
      throw fieldError('pullToDay', (e as Error).message);
    }
  }
}

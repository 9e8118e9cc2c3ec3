import { LOG_FUTURE_TOLERANCE_MS, assertPullWindow, bandProblem, todayIn, type Range } from '@broodsilk/shared';
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

export interface SacChoices {
  pulledAt: Date | null;
  leftWithMother: boolean;
  temperatureBand: Range | null;
  humidityBand: Range | null;
}

/** A sac is either pulled or left with the mother; each band is one the readings could hold. */
export function assertSacChoices(c: SacChoices): void {
  if (c.leftWithMother && c.pulledAt) {
    throw fieldError('leftWithMother', 'This sac is recorded as pulled; remove the pull first if it went back to the mother.');
  }
  const t = c.temperatureBand && bandProblem('temperature', c.temperatureBand);
  if (t) throw fieldError('temperatureBand', t);
  const h = c.humidityBand && bandProblem('humidity', c.humidityBand);
  if (h) throw fieldError('humidityBand', h);
}

import { LOG_FUTURE_TOLERANCE_MS, bandProblem, pullWindowProblem, todayIn, type Range } from '@broodsilk/shared';
import { fieldError } from '../common/field-errors';
import { refusal, type RefusalKey } from '../common/refusal';

/** The refusal of a time in the future, by what the time is of. */
type FutureKey = Extract<RefusalKey, `sac.future${string}`>;

/** An instant may be up to a minute ahead of the server's clock (phones and servers disagree a little). */
export function assertNotFuture(field: string, what: FutureKey, at: Date, now: Date): void {
  if (at.getTime() > now.getTime() + LOG_FUTURE_TOLERANCE_MS) {
    throw fieldError(field, refusal(what, { at: at.toISOString() }));
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
  if (s.layDate > today) throw fieldError('layDate', refusal('sac.layDateAfterToday', { layDate: s.layDate, today }));
  if (s.pulledAt) {
    assertNotFuture('pulledAt', 'sac.futurePull', s.pulledAt, now);
    const pulledOn = todayIn(timeZone, s.pulledAt);
    if (pulledOn < s.layDate) throw fieldError('pulledAt', refusal('sac.pulledBeforeLaid', { pulledOn, layDate: s.layDate }));
  }
  if ((s.pullFromDay == null) !== (s.pullToDay == null)) {
    throw fieldError(s.pullFromDay == null ? 'pullFromDay' : 'pullToDay', refusal('sac.pullDaysBoth'));
  }
  const window = s.pullFromDay != null && s.pullToDay != null && pullWindowProblem({ fromDay: s.pullFromDay, toDay: s.pullToDay });
  if (window) throw fieldError('pullToDay', window); // a shared rule's keyed sentence
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
    throw fieldError('leftWithMother', refusal('sac.pulledNotWithMother'));
  }
  const t = c.temperatureBand && bandProblem('temperature', c.temperatureBand);
  if (t) throw fieldError('temperatureBand', t); // shared rules' keyed sentences
  const h = c.humidityBand && bandProblem('humidity', c.humidityBand);
  if (h) throw fieldError('humidityBand', h);
}

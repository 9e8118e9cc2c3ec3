import { describe, expect, it } from 'vitest';
import { checkCount } from './brood-count-rules.js';

// common practice: young only leave a brood between counts (deaths, hand-overs); none appear.
describe('checkCount', () => {
  const exact = { alive: 220, on: '2026-03-08', estimated: false };
  it('accepts the first count and any count up to the last exact one', () => {
    expect(checkCount(500, null)).toBeNull();
    expect(checkCount(220, exact)).toBeNull();
    expect(checkCount(0, exact)).toBeNull();
  });
  it('refuses more than the last exact count, giving both numbers and the date', () => {
    expect(checkCount(500, exact)).toEqual({
      refuse: {
        key: 'rule.count.aboveLast',
        values: { previous: 220, on: '2026-03-08', alive: 500 },
        message:
          '220 were alive at the last count on 2026-03-08; 500 is more than that. Young are not added between counts: correct the earlier count if it was wrong.',
      },
    });
    expect(checkCount(221, exact)).not.toBeNull();
  });
  it('lets a kept-back batch that joined since raise the ceiling', () => {
    expect(checkCount(260, exact, 40)).toBeNull();
    expect(checkCount(261, exact, 40)).toMatchObject({
      refuse: { key: 'rule.count.aboveLastJoined', message: expect.stringContaining('40 kept-back young joined the brood since (260 in all); 261 is more') },
    });
  });
  it('only warns above an estimate', () => {
    const check = checkCount(240, { ...exact, estimated: true });
    expect(check).toMatchObject({
      warn: {
        code: 'count-above-estimate',
        key: 'rule.warning.count-above-estimate',
        values: { previous: 220, on: '2026-03-08', alive: 240 },
        message: expect.stringContaining('About 220 were alive by the estimate on 2026-03-08; 240'),
      },
    });
  });
});

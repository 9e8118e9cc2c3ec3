import { describe, expect, it } from 'vitest';
import { keptBackWords, type KeptBackBatchResponse } from './kept-back.types.js';

// The words a partner reads about eggs kept back at an opening (docs/product.md, "Opening and brood").
const batch = (over: Partial<KeptBackBatchResponse>): KeptBackBatchResponse => ({
  id: 'b',
  sacId: 's',
  eggs: 5,
  keptAt: '2026-03-01T09:00:00Z',
  state: 'incubating',
  endedAt: null,
  joined: null,
  reason: null,
  endedBy: null,
  rolls: 0,
  lastRollAt: null,
  log: [],
  ...over,
});
const day = (instant: string) => instant.slice(0, 10);

describe('the kept-back batch in plain words', () => {
  it('says it is still incubating and how often it was rolled', () => {
    expect(keptBackWords(batch({ rolls: 4, lastRollAt: '2026-03-03T08:00:00Z' }), day)).toBe(
      '5 eggs kept back at the opening on 2026-03-01 for more incubation: still incubating, rolled 4 times, last on 2026-03-03.',
    );
    expect(keptBackWords(batch({ eggs: 1 }), day)).toBe('1 egg kept back at the opening on 2026-03-01 for more incubation: still incubating, not rolled yet.');
  });

  it('says a written-off batch did not develop and is not part of the brood, with the reason', () => {
    expect(keptBackWords(batch({ state: 'written-off', endedAt: '2026-03-05T10:00:00Z', reason: 'all turned dark.' }), day)).toBe(
      'The 5 eggs kept back at the opening on 2026-03-01 for more incubation did not develop: written off on 2026-03-05 (all turned dark). They are not part of the brood.',
    );
  });

  it('says how many joined the brood and how many did not', () => {
    expect(keptBackWords(batch({ state: 'joined', joined: 3, endedAt: '2026-03-09T10:00:00Z', reason: 'hatched late' }), day)).toBe(
      'Of the 5 eggs kept back at the opening on 2026-03-01 for more incubation, 3 joined the brood on 2026-03-09 and 2 did not develop (hatched late).',
    );
  });
});

import { describe, expect, it } from 'vitest';
import { openingCountWarnings } from './opening-plausibility.js';

// docs/trade-facts.md check value 8: 1 to 2000 eggs a sac across the family; Brachypelma smithi at
// most 600 (brachypelma-smithi.de); Theraphosa at most 200 (tarantulaspider.net).
describe('opening counts against the species range (a warning, never a refusal)', () => {
  const smithi = { min: 100, max: 600 }; // the older, wider Brachypelma range, docs/trade-facts.md §6

  it('accepts counts within the range, its ends included', () => {
    expect(openingCountWarnings(100, smithi, false)).toEqual([]);
    expect(openingCountWarnings(600, smithi, false)).toEqual([]);
  });

  it('warns above the most a species lays: 601 for B. smithi', () => {
    const [w] = openingCountWarnings(601, smithi, false);
    expect(w!.code).toBe('eggs-outside-species-range');
    expect(w!.message).toContain('more than this species usually lays (100–600 a sac)');
  });

  it('warns below the range and says "about" for an estimate: a Theraphosa sac of about 250 (at most 200)', () => {
    const [w] = openingCountWarnings(250, { min: 50, max: 200 }, true);
    expect(w!.message.startsWith('About 250 eggs and young is more than')).toBe(true);
    const [low] = openingCountWarnings(12, smithi, false);
    expect(low!.message).toContain('12 eggs and young is fewer than');
  });
});

import { describe, expect, it } from 'vitest';
import { BROOD_STAGES, broodStageLabel, compareBroodStages, isBroodStage, isBroodStageAtLeast } from './brood-stage.js';
import { wordsFor } from '../i18n/words.js';

// Order of development: docs/trade-facts.md §1 (egg → prelarva "eggs with legs" → … → free-living nymph),
// after Vachon 1957 as applied on brachypelma-smithi.de. Label sets: docs/trade-facts.md §1, from memory.
describe('brood stages', () => {
  it('orders the stages as they develop', () => {
    const shuffled = ['second-instar', 'eggs', 'first-instar', 'eggs-with-legs'] as const;
    expect([...shuffled].sort(compareBroodStages)).toEqual(BROOD_STAGES);
    expect(isBroodStageAtLeast('first-instar', 'first-instar')).toBe(true);
    expect(isBroodStageAtLeast('eggs-with-legs', 'first-instar')).toBe(false);
    expect(isBroodStageAtLeast('second-instar', 'eggs')).toBe(true);
  });

  it('names every stage in both numbering sets (docs/rules.md, Stage numbering; from memory)', () => {
    const t = wordsFor('en');
    expect(broodStageLabel(t, 'first-instar')).toBe('1st instar');
    expect(broodStageLabel(t, 'first-instar', 'de')).toBe('N1 (1st nymph)');
    expect(broodStageLabel(wordsFor('de'), 'eggs-with-legs', 'de')).toMatch(/Prälarve/);
    expect(() => broodStageLabel(t, 'larva' as never)).toThrow(RangeError);
  });

  it('tells stages from other strings', () => {
    expect(isBroodStage('eggs')).toBe(true);
    expect(isBroodStage('larva')).toBe(false);
    expect(isBroodStage(3)).toBe(false);
    expect(() => compareBroodStages('larva' as never, 'eggs')).toThrow(/not a brood stage/);
  });
});

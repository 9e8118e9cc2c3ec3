import { describe, expect, it } from 'vitest';
import {
  BROOD_STAGES,
  GERMAN_BROOD_STAGE_LABELS,
  US_BROOD_STAGE_LABELS,
  broodStageLabel,
  compareBroodStages,
  isBroodStage,
  isBroodStageAtLeast,
} from './brood-stage.js';

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

  it('labels every stage in both label sets', () => {
    for (const stage of BROOD_STAGES) {
      expect(US_BROOD_STAGE_LABELS[stage]).toBeTruthy();
      expect(GERMAN_BROOD_STAGE_LABELS[stage]).toBeTruthy();
    }
    expect(broodStageLabel('first-instar')).toBe('1st instar');
    expect(broodStageLabel('first-instar', GERMAN_BROOD_STAGE_LABELS)).toBe('N1');
    expect(broodStageLabel('eggs-with-legs', GERMAN_BROOD_STAGE_LABELS)).toMatch(/Prälarve/);
  });

  it('tells stages from other strings', () => {
    expect(isBroodStage('eggs')).toBe(true);
    expect(isBroodStage('larva')).toBe(false);
    expect(isBroodStage(3)).toBe(false);
    expect(() => compareBroodStages('larva' as never, 'eggs')).toThrow(/not a brood stage/);
  });
});

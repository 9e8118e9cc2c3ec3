import { describe, expect, it } from 'vitest';
import { wordsFor } from '@broodsilk/shared';
import { sampledRange, sourceLabel } from './species-view';

const dorHenaut = { kind: 'published', citation: 'Dor & Hénaut 2012' } as const;

describe('sampledRange', () => {
  it('says a figure from two sacs is one (Dor & Hénaut 2012: 200 young a sac, n = 2; docs/trade-facts.md check value 3)', () => {
    const vagans = { value: { min: 200, max: 200 }, source: { ...dorHenaut, sampleSize: { count: 2, unit: 'sacs' as const } } };
    expect(sampledRange(wordsFor('en'), vagans)).toBe('about 200, n = 2 sacs');
    expect(sampledRange(wordsFor('de'), vagans)).toBe('etwa 200, n = 2 Kokons');
  });

  it('uses the singular for one observation', () => {
    const one = { value: { min: 80, max: 100 }, source: { ...dorHenaut, sampleSize: { count: 1, unit: 'sacs' as const } } };
    expect(sampledRange(wordsFor('en'), one)).toBe('about 80–100, n = 1 sac');
  });

  it('keeps a range without a small sample as it is', () => {
    expect(sampledRange(wordsFor('en'), { value: { min: 100, max: 600 }, source: dorHenaut })).toBe('100–600');
    const many = { value: { min: 100, max: 600 }, source: { ...dorHenaut, sampleSize: { count: 40, unit: 'sacs' as const } } };
    expect(sampledRange(wordsFor('en'), many)).toBe('100–600');
  });
});

describe('sourceLabel', () => {
  it('names the publication, or marks common practice and memory in the reader’s language', () => {
    expect(sourceLabel(wordsFor('en'), dorHenaut)).toBe('Dor & Hénaut 2012');
    expect(sourceLabel(wordsFor('en'), { kind: 'memory' })).toBe('from memory');
    expect(sourceLabel(wordsFor('de'), { kind: 'common-practice' })).toBe('gängige Praxis');
  });
});

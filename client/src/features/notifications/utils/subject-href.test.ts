import { describe, expect, it } from 'vitest';
import { subjectHref } from './subject-href';

describe('subjectHref', () => {
  it('leads to the sac, the animal, the project, or today for a digest', () => {
    expect(subjectHref({ subject: { type: 'sac', id: 's1' } })).toBe('/sacs/s1');
    expect(subjectHref({ subject: { type: 'project', id: 'p1' } })).toBe('/projects/p1');
    expect(subjectHref({ subject: { type: 'animal', id: 'a1' } })).toBe('/collection/a1');
    expect(subjectHref({ subject: null })).toBe('/');
  });
});

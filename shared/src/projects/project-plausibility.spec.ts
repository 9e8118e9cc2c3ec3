import { describe, expect, it } from 'vitest';
import { secondProjectWarnings } from './project-plausibility.js';

// common practice: a female is paired again once her brood is out of the sac, not while it develops.
describe('secondProjectWarnings', () => {
  it('warns only when an open project of the female has a developing sac', () => {
    expect(secondProjectWarnings('MO-7', [])).toEqual([]);
    expect(secondProjectWarnings('MO-7', [{ title: 'Spring', sacs: [{ layDate: '2026-01-01', fate: 'failed' }] }])).toEqual([]);
    expect(secondProjectWarnings('MO-7', [{ title: 'Spring', sacs: [{ layDate: '2026-01-01', fate: 'developing' }] }])).toEqual([
      {
        code: 'female-has-brood-in-progress',
        key: 'rule.warning.female-has-brood-in-progress',
        values: { female: 'MO-7', project: 'Spring' },
        message: expect.stringContaining('MO-7 has a brood in progress in the open project "Spring"'),
      },
    ]);
  });
});

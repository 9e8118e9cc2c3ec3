import { describe, expect, it } from 'vitest';
import { termsStatuses } from './terms-status';

describe('termsStatuses', () => {
  it('nothing is in force until every partner accepted; the owner alone (no partners) is enough', () => {
    expect(termsStatuses([{ number: 1, mustAccept: ['p1', 'p2'], accepted: ['p1'] }])).toEqual({ inForce: null, status: new Map([[1, 'proposed']]) });
    expect(termsStatuses([{ number: 1, mustAccept: [], accepted: [] }]).inForce).toBe(1);
  });

  it('a newer version awaiting acceptance leaves the older one in force', () => {
    const r = termsStatuses([
      { number: 1, mustAccept: ['p1'], accepted: ['p1'] },
      { number: 2, mustAccept: ['p1'], accepted: [] },
      { number: 3, mustAccept: ['p1'], accepted: [] },
    ]);
    expect(r.inForce).toBe(1);
    expect([...r.status]).toEqual([
      [1, 'in-force'],
      [2, 'proposed'],
      [3, 'proposed'],
    ]);
  });

  it('once a newer version is accepted, every older one is superseded, accepted or not', () => {
    const r = termsStatuses([
      { number: 1, mustAccept: ['p1'], accepted: ['p1'] },
      { number: 2, mustAccept: ['p1'], accepted: [] },
      { number: 3, mustAccept: ['p1'], accepted: ['p1'] },
    ]);
    expect(r.inForce).toBe(3);
    expect([...r.status]).toEqual([
      [1, 'superseded'],
      [2, 'superseded'],
      [3, 'in-force'],
    ]);
  });
});

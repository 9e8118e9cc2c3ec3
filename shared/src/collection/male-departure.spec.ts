import { describe, expect, it } from 'vitest';
import { maleDepartureSummary } from './male-departure.js';

// The failure clauses are the breeding-loan customs of TRADE-FACTS §7 ("no sac, no payout", or the
// deal carries over to a next sac or pairing), common practice with no written source. Names are invented.
describe('what a project says when its male departs', () => {
  it('names the return date and ends the loan', () => {
    expect(maleDepartureSummary('returned', 'Brass', '2026-11-02', 'nothing-owed')).toBe(
      'The male Brass went back to his owner on 2026-11-02; his breeding loan is over.',
    );
  });

  it('names the clause that now applies after a death', () => {
    expect(maleDepartureSummary('died', 'Brass', '2026-11-02', 'nothing-owed')).toMatch(/^The male Brass died on 2026-11-02\. .*nothing is owed/);
    expect(maleDepartureSummary('died', 'Brass', '2026-11-02', 'carries-over')).toMatch(/carries over.*next pairing or sac/);
  });

  it('says so when no terms are in force', () => {
    expect(maleDepartureSummary('died', 'Brass', '2026-11-02', null)).toMatch(/No terms are in force/);
  });
});

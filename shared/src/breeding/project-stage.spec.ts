import { describe, expect, it } from 'vitest';
import type { PairingFact, SacFact } from './pairing.types.js';
import { PROJECT_STAGE_LINE, deriveProjectStage, type ProjectFacts } from './project-stage.js';

// Rules are our own (docs/product.md, Project stages); the female-molt rule follows docs/trade-facts.md §5:
// stored sperm is shed with a molt (tarantulaspider.net; reptarach.de). Dates are an invented scenario.
const facts = (over: Partial<ProjectFacts> = {}): ProjectFacts => ({ pairings: [], femaleMolts: [], sacs: [], ...over });
const paired = (on: string, outcome: PairingFact['outcome'] = 'connected'): PairingFact => ({ on, outcome });
const sac = (over: Partial<SacFact> = {}): SacFact => ({ id: 's1', layDate: '2026-03-01', fate: 'developing', ...over });

describe('project stage', () => {
  it('keeps the progress line in order', () => {
    expect(PROJECT_STAGE_LINE).toEqual(['planned', 'paired', 'waiting-for-sac', 'sac-laid', 'in-incubator', 'brood', 'shares-settled', 'closed']);
  });

  it('marks "paired" unrecorded for a sac with no successful pairing recorded before it', () => {
    expect(deriveProjectStage(facts({ sacs: [sac()] }))).toEqual({ stage: 'sac-laid', sacId: 's1', unrecorded: ['paired'] });
    expect(deriveProjectStage(facts({ sacs: [sac({ pulledOn: '2026-03-20' })], pairings: [paired('2026-03-02')] }))).toMatchObject({ unrecorded: ['paired'] });
    expect(deriveProjectStage(facts({ sacs: [sac()], pairings: [paired('2025-11-01')] }))).toEqual({ stage: 'sac-laid', sacId: 's1' });
  });

  it('is planned with nothing recorded', () => {
    expect(deriveProjectStage(facts())).toEqual({ stage: 'planned' });
  });

  it.each(['interest-only', 'female-refused', 'aggression'] as const)('is paired after an attempt that ended %s', (outcome) => {
    expect(deriveProjectStage(facts({ pairings: [paired('2025-11-01', outcome)] }))).toEqual({ stage: 'paired' });
  });

  it('waits for a sac after a connected pairing, whatever came after it', () => {
    expect(deriveProjectStage(facts({ pairings: [paired('2025-11-01'), paired('2025-11-08', 'female-refused')] }))).toEqual({ stage: 'waiting-for-sac' });
    // the male died after connecting: the female can still lay
    expect(deriveProjectStage(facts({ pairings: [paired('2025-11-01'), paired('2025-11-08', 'male-lost')], maleDiedOn: '2025-11-08' }))).toEqual({
      stage: 'waiting-for-sac',
    });
    // a molt before the pairing does not matter
    expect(deriveProjectStage(facts({ pairings: [paired('2025-11-01')], femaleMolts: ['2025-08-01'] }))).toEqual({ stage: 'waiting-for-sac' });
  });

  it('goes back to paired, open, when the female molts after the last connected pairing and before a sac', () => {
    const base = { pairings: [paired('2025-11-01')], femaleMolts: ['2026-01-15'] };
    expect(deriveProjectStage(facts(base))).toEqual({ stage: 'paired', setback: 'female-molted' });
    expect(deriveProjectStage(facts({ ...base, femaleMolts: ['2025-11-01'] }))).toEqual({ stage: 'paired', setback: 'female-molted' }); // same day counts as after
    // a later attempt that did not connect does not help
    expect(deriveProjectStage(facts({ ...base, pairings: [...base.pairings, paired('2026-03-01', 'interest-only')] }))).toMatchObject({
      setback: 'female-molted',
    });
    // a later connected pairing does
    expect(deriveProjectStage(facts({ ...base, pairings: [...base.pairings, paired('2026-03-01')] }))).toEqual({ stage: 'waiting-for-sac' });
  });

  it('stays open with a setback when the male dies before any connected pairing', () => {
    expect(deriveProjectStage(facts({ maleDiedOn: '2025-10-01' }))).toEqual({ stage: 'planned', setback: 'male-died' });
    expect(deriveProjectStage(facts({ pairings: [paired('2025-11-01', 'male-lost')] }))).toEqual({ stage: 'paired', setback: 'male-died' });
    expect(deriveProjectStage(facts({ pairings: [paired('2025-11-01', 'aggression')], maleDiedOn: '2025-11-20' }))).toMatchObject({ setback: 'male-died' });
    // a backup male connects after the first one was lost: waiting for a sac again
    expect(deriveProjectStage(facts({ pairings: [paired('2025-11-01', 'male-lost'), paired('2025-12-01')] }))).toEqual({ stage: 'waiting-for-sac' });
  });

  it('follows a sac from laying to the incubator, the brood and settled shares', () => {
    const pairings = [paired('2025-11-01')];
    expect(deriveProjectStage(facts({ pairings, sacs: [sac()] }))).toEqual({ stage: 'sac-laid', sacId: 's1' });
    expect(deriveProjectStage(facts({ pairings, sacs: [sac({ broodStage: 'eggs-with-legs' })] }))).toEqual({ stage: 'sac-laid', sacId: 's1' });
    expect(deriveProjectStage(facts({ pairings, sacs: [sac({ pulledOn: '2026-03-25' })] }))).toEqual({ stage: 'in-incubator', sacId: 's1' });
    expect(deriveProjectStage(facts({ pairings, sacs: [sac({ pulledOn: '2026-03-25', broodStage: 'first-instar' })] }))).toEqual({
      stage: 'brood',
      sacId: 's1',
    });
    // a sac left with the mother also gives a brood
    expect(deriveProjectStage(facts({ pairings, sacs: [sac({ broodStage: 'second-instar' })] }))).toEqual({ stage: 'brood', sacId: 's1' });
    expect(deriveProjectStage(facts({ pairings, sacs: [sac({ broodStage: 'second-instar' })], sharesSettled: true }))).toEqual({
      stage: 'shares-settled',
      sacId: 's1',
    });
  });

  it('ignores a female molt once a sac is laid', () => {
    expect(deriveProjectStage(facts({ pairings: [paired('2025-11-01')], sacs: [sac()], femaleMolts: ['2026-05-01'] }))).toMatchObject({ stage: 'sac-laid' });
  });

  it('stays open with a setback when the sac fails or is eaten, until she is paired again', () => {
    const pairings = [paired('2025-11-01')];
    expect(deriveProjectStage(facts({ pairings, sacs: [sac({ fate: 'failed' })] }))).toEqual({ stage: 'planned', setback: 'sac-failed', sacId: 's1' });
    expect(deriveProjectStage(facts({ pairings, sacs: [sac({ fate: 'eaten' })] }))).toEqual({ stage: 'planned', setback: 'sac-eaten', sacId: 's1' });
    // a failed brood after first instar is still a failed sac
    expect(deriveProjectStage(facts({ pairings, sacs: [sac({ fate: 'failed', broodStage: 'first-instar' })] }))).toMatchObject({ setback: 'sac-failed' });
    // an attempt after the sac that did not connect: paired, the setback still stands
    expect(deriveProjectStage(facts({ pairings: [...pairings, paired('2026-04-01', 'female-refused')], sacs: [sac({ fate: 'eaten' })] }))).toEqual({
      stage: 'paired',
      setback: 'sac-eaten',
      sacId: 's1',
    });
    // re-paired after the failure: waiting again; a molt after the new pairing is a new setback
    const again = { pairings: [...pairings, paired('2026-05-01')], sacs: [sac({ fate: 'eaten' })] };
    expect(deriveProjectStage(facts(again))).toEqual({ stage: 'waiting-for-sac' });
    expect(deriveProjectStage(facts({ ...again, femaleMolts: ['2026-07-01'] }))).toEqual({ stage: 'paired', setback: 'female-molted' });
    // a second sac after the failed one
    expect(deriveProjectStage(facts({ ...again, sacs: [sac({ fate: 'eaten' }), sac({ id: 's2', layDate: '2026-08-01', pulledOn: '2026-08-25' })] }))).toEqual({
      stage: 'in-incubator',
      sacId: 's2',
    });
  });

  it('prefers the sac furthest along when several are live', () => {
    const sacs = [sac({ id: 'a', layDate: '2026-03-01', pulledOn: '2026-03-25' }), sac({ id: 'b', layDate: '2026-06-01' })];
    expect(deriveProjectStage(facts({ pairings: [paired('2025-11-01')], sacs }))).toEqual({ stage: 'in-incubator', sacId: 'a' });
  });

  it('lets the keeper close or end a project', () => {
    const brood = { pairings: [paired('2025-11-01')], sacs: [sac({ broodStage: 'second-instar' })], sharesSettled: true };
    expect(deriveProjectStage(facts({ ...brood, closedOn: '2026-09-01' }))).toEqual({ stage: 'closed' });
    expect(deriveProjectStage(facts({ pairings: [paired('2025-11-01')], endedEarly: 'no-sac' }))).toEqual({ stage: 'ended-early', reason: 'no-sac' });
    // closing after an early end: closed wins
    expect(deriveProjectStage(facts({ ...brood, endedEarly: 'sac-failed', closedOn: '2026-09-01' }))).toEqual({ stage: 'closed' });
    // only the keeper ends a project: no fact alone gives ended-early
    expect(
      deriveProjectStage(facts({ pairings: [paired('2025-11-01', 'male-lost')], maleDiedOn: '2025-11-01', sacs: [sac({ fate: 'eaten' })] })).stage,
    ).not.toBe('ended-early');
  });

  it('rejects impossible dates with a readable message', () => {
    expect(() => deriveProjectStage(facts({ pairings: [paired('2025-02-30')] }))).toThrow(/pairing date "2025-02-30"/);
    expect(() => deriveProjectStage(facts({ sacs: [sac({ layDate: '26-03-01' })] }))).toThrow(/lay date/);
  });
});

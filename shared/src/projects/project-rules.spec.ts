import { describe, expect, it } from 'vitest';
import { PROJECT_STAGE_LINE } from '../breeding/project-stage.js';
import { ANIMAL_STATUSES } from '../collection/animals.types.js';
import { PROJECT_ROLES } from './project.types.js';
import { isDealParty, isHandsOn, isProjectOpen, mayClose, mayReopen, mayStartProject } from './project-rules.js';

// Product rules (PRODUCT.md), not an outside source: the expected sets are written out by hand.
describe('project rules', () => {
  it('a project is open in every stage but closed and ended early', () => {
    const stages = [...PROJECT_STAGE_LINE, 'ended-early' as const];
    expect(stages.filter((stage) => !isProjectOpen(stage))).toEqual(['closed', 'ended-early']);
    expect(stages.filter(isProjectOpen)).toHaveLength(7);
  });

  it('only an early end can be reopened; a closed project is final, every other one can be closed', () => {
    const stages = [...PROJECT_STAGE_LINE, 'ended-early' as const];
    expect(stages.filter(mayReopen)).toEqual(['ended-early']);
    expect(stages.filter((stage) => !mayClose(stage))).toEqual(['closed']);
  });

  it('only an active animal or one on loan may start a project', () => {
    expect(ANIMAL_STATUSES.filter((status) => mayStartProject({ status }))).toEqual(['active', 'on-loan']);
  });

  it('the owner and a caretaker look after the sacs, a partner does not', () => {
    expect(PROJECT_ROLES.filter(isHandsOn)).toEqual(['owner', 'caretaker']);
  });

  it('the owner and partners are parties to the deal (terms, account), a caretaker is not', () => {
    expect(PROJECT_ROLES.filter(isDealParty)).toEqual(['owner', 'partner']);
  });
});

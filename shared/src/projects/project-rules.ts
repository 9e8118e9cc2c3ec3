import type { ProjectStage } from '../breeding/project-stage.js';
import type { AnimalStatus } from '../collection/animals.types.js';
import type { ProjectRole } from './project.types.js';

/**
 * A project is open until its keeper closes it or ends it early; only an open project takes new sacs and
 * pairings. A setback (a sac eaten, a molt after pairing, a dead male) leaves it open for another attempt.
 */
export function isProjectOpen(stage: ProjectStage): boolean {
  return stage !== 'closed' && stage !== 'ended-early';
}

/** Statuses of an animal that can start a project: a sold or dead animal cannot. */
export const PROJECT_READY_STATUSES: readonly AnimalStatus[] = ['active', 'on-loan'];

/** Whether an animal may be the female or the male of a new project. */
export function mayStartProject(animal: { status: AnimalStatus }): boolean {
  return PROJECT_READY_STATUSES.includes(animal.status);
}

/** Roles that look after the sacs (rolls, care log, brood counts): the owner and a caretaker, not a partner. */
export const HANDS_ON_ROLES: readonly ProjectRole[] = ['owner', 'caretaker'];

export function isHandsOn(role: ProjectRole): boolean {
  return HANDS_ON_ROLES.includes(role);
}

/** The deal (terms, shares, the account) is between the owner and the partners; a caretaker looks after the sacs but is no party to it. */
export const DEAL_PARTY_ROLES: readonly ProjectRole[] = ['owner', 'partner'];

/** Whether this role reads the terms and the account of the project. */
export function isDealParty(role: ProjectRole): boolean {
  return DEAL_PARTY_ROLES.includes(role);
}

/** Only an early end can be undone: a closed project stays closed. */
export function mayReopen(stage: ProjectStage): boolean {
  return stage === 'ended-early';
}

/** The keeper closes a project when it is done, also after an early end; closing is final. */
export function mayClose(stage: ProjectStage): boolean {
  return stage !== 'closed';
}

import type { ProjectStage } from '../breeding/project-stage.js';
import type { AnimalStatus } from '../collection/animals.types.js';
import type { ProjectRole } from './project.types.js';

/** A project is open until it is closed or ends early; only an open project takes new sacs, pairings and rolls. */
export function isProjectOpen(stage: ProjectStage): boolean {
  return stage !== 'closed' && stage !== 'ended-early';
}

/** Statuses of an animal that can start a project: a sold or dead animal cannot. */
export const PROJECT_READY_STATUSES: readonly AnimalStatus[] = ['active', 'on-loan'];

/** Whether an animal may be the female or the male of a new project. */
export function mayStartProject(animal: { status: AnimalStatus }): boolean {
  return PROJECT_READY_STATUSES.includes(animal.status);
}

/** The deal (terms, shares, the account) is between the owner and the partners; a caretaker looks after the sacs but is no party to it. */
export const DEAL_PARTY_ROLES: readonly ProjectRole[] = ['owner', 'partner'];

/** Whether this role reads the terms and the account of the project. */
export function isDealParty(role: ProjectRole): boolean {
  return DEAL_PARTY_ROLES.includes(role);
}

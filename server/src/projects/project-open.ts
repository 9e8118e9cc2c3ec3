import { ConflictException } from '@nestjs/common';
import type { Project } from './project.entity';
import { refusal } from '../common/refusal';

/**
 * Only the keeper ends or closes a project; until then it takes new pairings and sacs, whatever went
 * wrong before (docs/product.md, Attempts). Corrections of what was recorded stay possible after the end.
 */
export function assertTakesNew(p: Pick<Project, 'endedEarlyReason' | 'closedOn'>, what: 'pairings' | 'sacs'): void {
  if (p.closedOn) throw new ConflictException(refusal(what === 'pairings' ? 'project.closedNoPairings' : 'project.closedNoSacs', { on: p.closedOn }));
  if (p.endedEarlyReason) throw new ConflictException(refusal(what === 'pairings' ? 'project.endedNoPairings' : 'project.endedNoSacs'));
}

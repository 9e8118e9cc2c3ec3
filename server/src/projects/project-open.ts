import { ConflictException } from '@nestjs/common';
import type { Project } from './project.entity';

/**
 * Only the keeper ends or closes a project; until then it takes new pairings and sacs, whatever went
 * wrong before (docs/product.md, Attempts). Corrections of what was recorded stay possible after the end.
 */
export function assertTakesNew(p: Pick<Project, 'endedEarlyReason' | 'closedOn'>, what: 'pairings' | 'sacs'): void {
  if (p.closedOn) throw new ConflictException({ message: `This project was closed on ${p.closedOn}, so no more ${what} can be recorded in it.` });
  if (p.endedEarlyReason)
    throw new ConflictException({ message: `This project ended early, so no more ${what} can be recorded in it; the keeper can reopen it first.` });
}

import type { ProjectRole } from '../projects/project.types.js';
import { isHandsOn } from '../projects/project-rules.js';
import type { SacPermissions } from './sacs.types.js';

/**
 * Who may do what with a sac (docs/product.md, Roles): the owner everything; caretakers log and
 * count, and record the pull and the opening where the owner switched that on; partners read.
 */
export function sacPermissions(role: ProjectRole, caretakersMayPullAndOpen: boolean): SacPermissions {
  const owner = role === 'owner';
  return {
    edit: owner,
    pullAndOpen: owner || (role === 'caretaker' && caretakersMayPullAndOpen),
    log: isHandsOn(role),
    setIncubatorRights: owner,
  };
}

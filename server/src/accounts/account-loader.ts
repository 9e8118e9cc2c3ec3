import type { EntityManager } from '@mikro-orm/postgresql';
import { ProjectMember } from '../projects/project-member.entity';
import type { Project } from '../projects/project.entity';
import { LedgerEntryRow } from './ledger-entry.entity';
import { sacCountsOf } from './sac-counts';
import { termsInForce } from './terms-in-force';
import { buildAccountView, type AccountView } from './account-view';

/** Loads a project's members, terms in force, sac counts and ledger, and works out the account. */
export async function loadAccount(em: EntityManager, project: Project): Promise<AccountView> {
  // One after another: inside a transaction they share one connection.
  const members = await em.find(ProjectMember, { project: project.id }, { populate: ['user'], orderBy: { createdAt: 'asc' } });
  const terms = await termsInForce(em, project.id);
  const sacs = await sacCountsOf(em, project.id);
  const rows = await em.find(
    LedgerEntryRow,
    { project: project.id },
    { populate: ['party', 'fromParty', 'toParty', 'target', 'recordedBy'], orderBy: { seq: 'asc' } },
  );
  return buildAccountView({ project, members, terms, sacs, rows });
}

import type { EntityManager } from '@mikro-orm/postgresql';
import { ProjectMember } from '../projects/project-member.entity';
import type { Project } from '../projects/project.entity';
import { LedgerEntryRow } from './ledger-entry.entity';
import { sacCountsOf, sacCountsOfMany } from './sac-counts';
import { pickInForce, termsInForce } from './terms-in-force';
import { TermsVersion } from '../projects/terms-version.entity';
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

/** The same for many projects with a fixed number of queries (the dashboard), keyed by project id. */
export async function loadAccounts(em: EntityManager, projects: readonly Project[]): Promise<Map<string, AccountView>> {
  const ids = projects.map((p) => p.id);
  if (!ids.length) return new Map();
  const members = await em.find(ProjectMember, { project: { $in: ids } }, { populate: ['user'], orderBy: { createdAt: 'asc' } });
  const versions = await em.find(
    TermsVersion,
    { project: { $in: ids } },
    { populate: ['lines', 'lines.member', 'lines.member.user', 'acceptances'], orderBy: { number: 'desc' } },
  );
  const sacs = await sacCountsOfMany(em, ids);
  const rows = await em.find(
    LedgerEntryRow,
    { project: { $in: ids } },
    { populate: ['party', 'fromParty', 'toParty', 'target', 'recordedBy'], orderBy: { seq: 'asc' } },
  );
  const of = <T extends { project: { id: string } }>(items: T[], id: string) => items.filter((x) => x.project.id === id);
  return new Map(
    projects.map((project) => [
      project.id,
      buildAccountView({
        project,
        members: of(members, project.id),
        terms: pickInForce(of(versions, project.id)),
        sacs: sacs.get(project.id) ?? [],
        rows: of(rows, project.id),
      }),
    ]),
  );
}

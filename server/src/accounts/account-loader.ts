import type { EntityManager } from '@mikro-orm/postgresql';
import { ProjectMember } from '../projects/project-member.entity';
import type { Project } from '../projects/project.entity';
import { LedgerEntryRow } from './ledger-entry.entity';
import { sacCountsByProject } from './sac-counts';
import { termsInForceOf } from './terms-in-force';
import { buildAccountView, type AccountView, type LedgerRowFacts } from './account-view';
import { ledgerRowFactsOf } from './ledger-row-facts';

/** Loads a project's members, terms in force, sac counts and ledger, and works out the account. */
export async function loadAccount(em: EntityManager, project: Project): Promise<AccountView> {
  return (await loadAccounts(em, [project])).get(project.id)!;
}

/**
 * The accounts of many projects in a fixed number of queries (lists ask for all of them at once).
 * One after another: inside a transaction they share one connection.
 */
export async function loadAccounts(em: EntityManager, projects: Project[]): Promise<Map<string, AccountView>> {
  return loadWith(em, projects, async (ids) => {
    // Parties are members loaded before and targets are rows of the same result: the identity map
    // resolves both, so joining them again would only hydrate every row a second time.
    const rows = await em.find(LedgerEntryRow, { project: { $in: ids } }, { populate: ['recordedBy'], orderBy: { seq: 'asc' } });
    return byProject(rows);
  });
}

/**
 * The same accounts with their ledgers read as plain rows (`ledgerRowFactsOf`): for reads of
 * balances, settlement and to-dos across many projects, where hydrating thousands of ledger
 * entities was most of the time. Same rules, same results (the last spec of test/accounts.e2e-spec.ts).
 */
export async function loadAccountFacts(em: EntityManager, projects: Project[]): Promise<Map<string, AccountView<LedgerRowFacts>>> {
  return loadWith(em, projects, (ids) => ledgerRowFactsOf(em, ids));
}

async function loadWith<R extends LedgerRowFacts>(
  em: EntityManager,
  projects: Project[],
  ledgersOf: (ids: string[]) => Promise<Map<string, R[]>>,
): Promise<Map<string, AccountView<R>>> {
  const ids = projects.map((p) => p.id);
  const members = await em.find(ProjectMember, { project: { $in: ids } }, { populate: ['user'], orderBy: { createdAt: 'asc' } });
  const terms = await termsInForceOf(em, ids, { membersLoaded: true });
  const sacs = await sacCountsByProject(em, ids);
  const ledgers = await ledgersOf(ids);
  const membersOf = byProject(members);
  return new Map(
    projects.map((p) => [
      p.id,
      buildAccountView({
        project: p,
        members: membersOf.get(p.id) ?? [],
        terms: terms.get(p.id) ?? null,
        sacs: sacs.get(p.id)!,
        rows: ledgers.get(p.id) ?? [],
      }),
    ]),
  );
}

/** Groups rows by project, keeping their order. */
function byProject<T extends { project: { id: string } }>(list: T[]): Map<string, T[]> {
  const out = new Map<string, T[]>();
  for (const x of list) {
    const group = out.get(x.project.id);
    if (group) group.push(x);
    else out.set(x.project.id, [x]);
  }
  return out;
}

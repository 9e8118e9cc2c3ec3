import type { EntityManager } from '@mikro-orm/postgresql';
import { TermsVersion } from '../projects/terms-version.entity';
import { acceptanceFacts, termsStatuses } from '../projects/terms-status';

/** Every version of the project with what the rule and the account read of it. */
const FULL = ['lines.member.user', 'acceptances'] as const;
/** The same when the projects' members (with their users) are loaded already: the identity map resolves them. */
const MEMBERS_LOADED = ['lines', 'acceptances'] as const;

/**
 * The version in force: the newest one every partner with a line has accepted (docs/product.md,
 * Data rules, Terms: proposed until every partner accepts, in force from then on; `termsStatuses`).
 */
export async function termsInForce(em: EntityManager, projectId: string): Promise<TermsVersion | null> {
  return (await termsInForceOf(em, [projectId])).get(projectId) ?? null;
}

/** The version in force of each project, in a fixed number of queries however many projects. */
export async function termsInForceOf(
  em: EntityManager,
  projectIds: string[],
  { membersLoaded = false }: { membersLoaded?: boolean } = {},
): Promise<Map<string, TermsVersion | null>> {
  const versions = await em.find(TermsVersion, { project: { $in: projectIds } }, { populate: membersLoaded ? MEMBERS_LOADED : FULL });
  const byProject = new Map<string, TermsVersion[]>(projectIds.map((id) => [id, []]));
  for (const v of versions) byProject.get(v.project.id)?.push(v);
  return new Map(
    [...byProject].map(([id, list]) => {
      const { inForce } = termsStatuses(list.map(acceptanceFacts));
      return [id, list.find((v) => v.number === inForce) ?? null];
    }),
  );
}

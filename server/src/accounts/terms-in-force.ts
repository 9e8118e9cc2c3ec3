import type { EntityManager } from '@mikro-orm/postgresql';
import { TermsVersion } from '../projects/terms-version.entity';

/**
 * The version in force: the newest one every partner with a line has accepted (docs/product.md,
 * Data rules, Terms: proposed until every partner accepts, in force from then on). The owner proposed it.
 */
export async function termsInForce(em: EntityManager, projectId: string): Promise<TermsVersion | null> {
  return (await termsInForceOf(em, [projectId])).get(projectId) ?? null;
}

/** The version in force of each project, in a fixed number of queries however many projects. */
export async function termsInForceOf(em: EntityManager, projectIds: string[]): Promise<Map<string, TermsVersion | null>> {
  const versions = await em.find(
    TermsVersion,
    { project: { $in: projectIds } },
    { populate: ['lines', 'lines.member', 'lines.member.user', 'acceptances'], orderBy: { number: 'desc' } },
  );
  const out = new Map<string, TermsVersion | null>(projectIds.map((id) => [id, null]));
  for (const v of versions) {
    if (out.get(v.project.id)) continue; // a newer version is already in force
    const accepted = new Set(v.acceptances.getItems().map((a) => a.member.id));
    const waiting = v.lines.getItems().filter((l) => l.member.role === 'partner' && !accepted.has(l.member.id));
    if (waiting.length === 0 && v.lines.length > 0) out.set(v.project.id, v);
  }
  return out;
}

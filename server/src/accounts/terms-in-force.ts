import type { EntityManager } from '@mikro-orm/postgresql';
import { TermsVersion } from '../projects/terms-version.entity';

/**
 * The version in force: the newest one every partner with a line has accepted (PRODUCT.md:
 * "a version is in force once every partner has accepted it"). The owner proposed it.
 */
export async function termsInForce(em: EntityManager, projectId: string): Promise<TermsVersion | null> {
  const versions = await em.find(
    TermsVersion,
    { project: projectId },
    { populate: ['lines', 'lines.member', 'lines.member.user', 'acceptances'], orderBy: { number: 'desc' } },
  );
  return pickInForce(versions);
}

/** The newest of a project's versions (newest first, lines, members and acceptances loaded) that every partner accepted. */
export function pickInForce(versions: readonly TermsVersion[]): TermsVersion | null {
  for (const v of versions) {
    const accepted = new Set(v.acceptances.getItems().map((a) => a.member.id));
    const waiting = v.lines.getItems().filter((l) => l.member.role === 'partner' && !accepted.has(l.member.id));
    if (waiting.length === 0 && v.lines.length > 0) return v;
  }
  return null;
}

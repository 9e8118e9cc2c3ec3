import type { EntityManager } from '@mikro-orm/postgresql';
import type { TermsTodo } from '@broodsilk/shared';
import { TermsVersion } from './terms-version.entity';
import { acceptanceFacts, termsStatuses } from './terms-status';

/** Proposed terms versions waiting for the user's own acceptance, over many projects in a fixed number of queries. */
export async function termsAwaitingAcceptance(em: EntityManager, userId: string, projectIds: string[]): Promise<TermsTodo[]> {
  if (!projectIds.length) return [];
  const versions = await em.find(
    TermsVersion,
    { project: { $in: projectIds } },
    { populate: ['project', 'lines.member', 'acceptances'], orderBy: { number: 'asc' } },
  );
  const out: TermsTodo[] = [];
  for (const projectId of projectIds) {
    const mine = versions.filter((v) => v.project.id === projectId);
    const { status } = termsStatuses(mine.map(acceptanceFacts));
    for (const v of mine) {
      const line = v.lines.getItems().find((l) => l.member.role === 'partner' && l.member.user?.id === userId);
      if (status.get(v.number) === 'proposed' && line && !v.acceptances.getItems().some((a) => a.member.id === line.member.id)) {
        out.push({ projectId, projectTitle: v.project.title, version: v.number });
      }
    }
  }
  return out;
}

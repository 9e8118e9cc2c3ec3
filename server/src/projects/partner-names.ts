import type { EntityManager } from '@mikro-orm/postgresql';
import { ProjectMember } from './project-member.entity';

/** The partners' names per project, for lists (one query for many projects). */
export async function partnerNamesOf(em: EntityManager, projectIds: string[]): Promise<Map<string, string[]>> {
  const byProject = new Map<string, string[]>(projectIds.map((id) => [id, []]));
  if (!projectIds.length) return byProject;
  const partners = await em.find(ProjectMember, { project: { $in: projectIds }, role: 'partner' }, { populate: ['user'], orderBy: { createdAt: 'asc' } });
  for (const m of partners) byProject.get(m.project.id)?.push(memberName(m));
  return byProject;
}

export function memberName(m: ProjectMember): string {
  return m.user?.displayName ?? m.name;
}

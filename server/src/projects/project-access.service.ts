import { ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { ProjectRole } from '@broodsilk/shared';
import { Project } from './project.entity';
import { ProjectMember } from './project-member.entity';
import { refusal, term } from '../common/refusal';

/** The caller's standing in one project, as the guard leaves it on the request. */
export interface ProjectAccess {
  project: Project;
  member: ProjectMember;
  role: ProjectRole;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * The one place that decides who may do what in a project. A non-member gets a 404 (the project's
 * existence is not revealed); a member without the right gets a 403 that says who may.
 */
@Injectable()
export class ProjectAccessService {
  constructor(private readonly em: EntityManager) {}

  async assertRole(projectId: string, userId: string, roles: readonly ProjectRole[], em: EntityManager = this.em): Promise<ProjectAccess> {
    if (!UUID.test(projectId)) throw new NotFoundException(refusal('project.notFound'));
    const member = await em.findOne(ProjectMember, { project: projectId, user: userId }, { populate: ['project'] });
    if (!member) throw new NotFoundException(refusal('project.notFound'));
    if (!roles.includes(member.role)) {
      throw new ForbiddenException(
        refusal('project.onlyRoles', { roles: term(`refusal.projectRoles.${roles.join('-')}`), role: term(`refusal.projectRole.${member.role}`) }),
      );
    }
    return { project: member.project, member, role: member.role };
  }

  /** The caller's role, or null when they are not a member (no error). */
  async roleOf(projectId: string, userId: string, em: EntityManager = this.em): Promise<ProjectRole | null> {
    if (!UUID.test(projectId)) return null;
    const member = await em.findOne(ProjectMember, { project: projectId, user: userId });
    return member?.role ?? null;
  }

  /** Ids of the projects the user belongs to (optionally with one of `roles`), for dashboards and lists. */
  async projectIdsOf(userId: string, roles?: readonly ProjectRole[], em: EntityManager = this.em): Promise<string[]> {
    const rows = await em.find(ProjectMember, { user: userId, ...(roles ? { role: { $in: [...roles] } } : {}) }, { fields: ['project'] });
    return rows.map((m) => m.project.id);
  }
}

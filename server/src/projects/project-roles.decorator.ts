import { createParamDecorator, SetMetadata, type ExecutionContext } from '@nestjs/common';
import type { ProjectRole } from '@broodsilk/shared';
import type { ProjectAccess } from './project-access.service';

export const PROJECT_ROLES_KEY = 'projectRoles';
export const PROJECT_FROM_KEY = 'projectFrom';

/**
 * Restricts a route to members of the project with one of these roles (non-members: 404, others:
 * 403). The project id comes from `:projectId`, else `:id`, unless `@ProjectFrom` says otherwise.
 */
export const ProjectRoles = (...roles: ProjectRole[]) => SetMetadata(PROJECT_ROLES_KEY, roles);

/** Every project role: any member may. */
export const AnyProjectMember = () => ProjectRoles('owner', 'partner', 'caretaker');

export interface ProjectFromSpec {
  kind: string;
  param: string;
}

/** The route's `:param` names a `kind` record (e.g. a sac); its module registered a resolver to its project. */
export const ProjectFrom = (kind: string, param = 'id') => SetMetadata(PROJECT_FROM_KEY, { kind, param } satisfies ProjectFromSpec);

/** The access the project-role guard established (project, member, role); only on guarded routes. */
export const CurrentProject = createParamDecorator((_data: unknown, ctx: ExecutionContext): ProjectAccess => {
  const access = ctx.switchToHttp().getRequest().projectAccess as ProjectAccess | undefined;
  if (!access) throw new Error('@CurrentProject() used on a route without @ProjectRoles(...)');
  return access;
});

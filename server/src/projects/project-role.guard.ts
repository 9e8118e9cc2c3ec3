import { CanActivate, ExecutionContext, Injectable, NotFoundException, UnauthorizedException } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { EntityManager } from '@mikro-orm/postgresql';
import type { ProjectRole } from '@broodsilk/shared';
import type { Request } from 'express';
import type { AuthUser } from '../common/auth-user';
import { PROJECT_FROM_KEY, PROJECT_ROLES_KEY, type ProjectFromSpec } from './project-roles.decorator';
import { ProjectAccessService } from './project-access.service';
import { ProjectResolverRegistry } from './project-resolver.registry';
import { refusal } from '../common/refusal';

/**
 * Global guard after authentication: on routes with `@ProjectRoles(...)` it finds the project,
 * checks the caller's role in it and leaves the result on the request for `@CurrentProject()`.
 */
@Injectable()
export class ProjectRoleGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly access: ProjectAccessService,
    private readonly resolvers: ProjectResolverRegistry,
    private readonly em: EntityManager,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const targets = [context.getHandler(), context.getClass()];
    const roles = this.reflector.getAllAndOverride<ProjectRole[] | undefined>(PROJECT_ROLES_KEY, targets);
    if (!roles?.length) return true;
    const req = context.switchToHttp().getRequest<Request & { user?: AuthUser; projectAccess?: unknown }>();
    if (!req.user) throw new UnauthorizedException(refusal('common.signIn'));
    const from = this.reflector.getAllAndOverride<ProjectFromSpec | undefined>(PROJECT_FROM_KEY, targets);
    const params = req.params as Record<string, string | undefined>;
    let projectId: string | null | undefined;
    if (from) {
      const id = params[from.param];
      projectId = id ? await this.resolvers.resolve(from.kind, this.em, id) : null;
    } else {
      projectId = params.projectId ?? params.id;
    }
    if (!projectId) throw new NotFoundException(refusal('project.notFound'));
    req.projectAccess = await this.access.assertRole(projectId, req.user.id, roles);
    return true;
  }
}

import { Injectable } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/postgresql';

/** Finds the project a sub-record (a sac, a ledger entry…) belongs to; null when there is no such record. */
export type ProjectResolver = (em: EntityManager, id: string) => Promise<string | null>;

/**
 * Routes whose path names a sub-record instead of the project (`/api/sacs/:id`) say so with
 * `@ProjectFrom('sac')`; the module owning that record registers here how to find its project
 * (in `onModuleInit`), so the guard need not know sacs.
 */
@Injectable()
export class ProjectResolverRegistry {
  private readonly resolvers = new Map<string, ProjectResolver>();

  register(kind: string, resolver: ProjectResolver): void {
    if (this.resolvers.has(kind)) throw new Error(`A project resolver for "${kind}" is already registered.`);
    this.resolvers.set(kind, resolver);
  }

  async resolve(kind: string, em: EntityManager, id: string): Promise<string | null> {
    const resolver = this.resolvers.get(kind);
    if (!resolver) throw new Error(`No project resolver registered for "${kind}"; register one in its module's onModuleInit.`);
    return resolver(em, id);
  }
}

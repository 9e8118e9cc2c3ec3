import { Injectable } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { AuthUser } from '../common/auth-user';

/** May `viewer` see the photos of this subject (an animal, a molt, a sac opening…)? */
export type PhotoAccessCheck = (em: EntityManager, viewer: AuthUser, subjectId: string) => Promise<boolean>;

/**
 * Each module owning a photo subject registers who may see it (in its `onModuleInit`); a photo is
 * served when any check for its subject type says yes, and is a 404 otherwise.
 */
@Injectable()
export class PhotoAccessRegistry {
  private readonly checks = new Map<string, PhotoAccessCheck[]>();

  register(subjectType: string, check: PhotoAccessCheck): void {
    this.checks.set(subjectType, [...(this.checks.get(subjectType) ?? []), check]);
  }

  async allows(em: EntityManager, viewer: AuthUser, subjectType: string, subjectId: string): Promise<boolean> {
    for (const check of this.checks.get(subjectType) ?? []) if (await check(em, viewer, subjectId)) return true;
    return false;
  }
}

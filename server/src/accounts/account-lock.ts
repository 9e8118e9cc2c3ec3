import { Injectable } from '@nestjs/common';
import { LockMode } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import { ProjectAccount } from './project-account.entity';

/**
 * Serialises writes to one project's account: `SELECT … FOR UPDATE` on its `project_accounts`
 * row inside the caller's transaction, held until commit. Tests replace this provider with one
 * whose `enabled` is false to show the race the lock prevents.
 */
@Injectable()
export class AccountLock {
  enabled = true;

  async take(tx: EntityManager, projectId: string): Promise<void> {
    // The row is made on first use; `on conflict do nothing` lets two first writers both go on.
    await tx.execute(
      `insert into project_accounts (id, created_at, updated_at, project_id) values (gen_random_uuid(), now(), now(), ?) on conflict (project_id) do nothing`,
      [projectId],
    );
    if (!this.enabled) return;
    await tx.findOneOrFail(ProjectAccount, { project: projectId }, { lockMode: LockMode.PESSIMISTIC_WRITE });
  }
}

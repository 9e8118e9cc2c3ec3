import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { SharesResponse } from '@broodsilk/shared';
import type { ProjectAccess } from '../projects/project-access.service';
import { loadAccount } from './account-loader';
import { trackShareBases } from './share-bases';
import { toSharesResponse } from './shares.mapper';
import { Clock } from '../common/clock';
import { loadReader } from '../users/reader-words';

@Injectable()
export class SharesService {
  constructor(
    private readonly em: EntityManager,
    private readonly clock: Clock,
  ) {}

  /** Shares per sac with their explanation, and what changed since the basis before, in the viewer's language. */
  async shares(access: ProjectAccess): Promise<SharesResponse> {
    return this.em.transactional(async (tx) => {
      const view = await loadAccount(tx, access.project);
      const { t } = await loadReader(tx, access.member.user);
      return toSharesResponse(view, await trackShareBases(tx, view, this.clock.now(), t), t);
    });
  }
}

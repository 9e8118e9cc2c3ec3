import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import { currentCountsOf, latestCountsOf } from './sac-queries';

/** The brood's counts as other modules (the partner account) read them. */
@Injectable()
export class BroodService {
  constructor(private readonly em: EntityManager) {}

  /**
   * The sac's count of young alive in care now: its latest brood count (0 before the opening).
   * For shares the accounts module adds what was already handed over, sold or cashed out.
   * Pass the caller's transaction `em` to read inside it.
   */
  async currentCount(sacId: string, em: EntityManager = this.em): Promise<number> {
    return (await currentCountsOf(em, [sacId])).get(sacId) ?? 0;
  }

  /** The same for many sacs at once (a project's account sums its sacs); missing sacs count 0. */
  async currentCounts(sacIds: string[], em: EntityManager = this.em): Promise<Map<string, number>> {
    const found = await currentCountsOf(em, sacIds);
    return new Map(sacIds.map((id) => [id, found.get(id) ?? 0]));
  }

  /** Alive and the instant of each sac's latest count (sacs without a count are missing from the map). */
  latestCounts(sacIds: string[], em: EntityManager = this.em): Promise<Map<string, { alive: number; at: Date }>> {
    return latestCountsOf(em, sacIds);
  }
}

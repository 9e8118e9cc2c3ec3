import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import { todayIn, type ProjectRole, type SacResponse } from '@broodsilk/shared';
import { effectiveBreeding } from '../species/effective-breeding';
import { ownBreeding } from '../species/species.mapper';
import type { Sac } from './sac.entity';
import { latestCountsOf, latestCareOf, openedSacsOf } from './sac-queries';
import { toSacResponse, type PullWindowInForce } from './sacs.mapper';
import { Clock } from '../common/clock';

/** The pull window in force: the sac's own days, else the species' (else day 21–45, common practice). Needs `project.female.species` loaded. */
export function windowOf(sac: Sac): PullWindowInForce {
  if (sac.pullFromDay != null && sac.pullToDay != null) return { fromDay: sac.pullFromDay, toDay: sac.pullToDay, origin: 'sac', source: null };
  const species = sac.project.female.species;
  const w = effectiveBreeding(species.group, ownBreeding(species)).pullWindow;
  return { fromDay: w.value.fromDay, toDay: w.value.toDay, origin: w.from === 'species' ? 'species' : 'default', source: w.source };
}

const READ_ONLY = (): ProjectRole => 'partner';

export const SAC_POPULATE = ['project.female.species'] as const;

/** Builds sac responses for one viewer, many sacs at once (a few queries, not a few per sac). */
@Injectable()
export class SacViewsService {
  constructor(private readonly clock: Clock) {}

  /** `roleOf` gives the viewer's role per project for `may`; without it the viewer may only read. */
  async build(
    em: EntityManager,
    sacs: Sac[],
    timeZone: string,
    now = this.clock.now(),
    roleOf: (projectId: string) => ProjectRole = READ_ONLY,
  ): Promise<SacResponse[]> {
    const ids = sacs.map((s) => s.id);
    const [care, counts, opened] = await Promise.all([latestCareOf(em, ids), latestCountsOf(em, ids), openedSacsOf(em, ids)]);
    const today = todayIn(timeZone, now);
    return sacs.map((s) =>
      toSacResponse(s, {
        today,
        now,
        window: windowOf(s),
        care: care.get(s.id) ?? {},
        role: roleOf(s.project.id),
        opened: opened.has(s.id),
        currentCount: counts.get(s.id)?.alive ?? null,
        currentCountEstimated: counts.get(s.id)?.estimated ?? false,
      }),
    );
  }

  async one(em: EntityManager, sac: Sac, timeZone: string, role: ProjectRole): Promise<SacResponse> {
    return (await this.build(em, [sac], timeZone, this.clock.now(), () => role))[0];
  }
}

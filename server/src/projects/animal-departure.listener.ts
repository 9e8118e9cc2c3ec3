import { Injectable } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/postgresql';
import { MALE_DEPARTURE_KINDS, maleDepartureSummary } from '@broodsilk/shared';
import type { AnimalDeparture } from '../animals/animal-departure.registry';
import { ActivityService } from '../activity/activity.service';
import { Project } from './project.entity';
import { Pairing } from './pairing.entity';
import { TermsService } from './terms.service';

/**
 * Writes the male's departure on his projects' timelines (as first or backup male): a return on each project he is in, a
 * death on each open one (not closed, not ended early) with the failure clause that now applies.
 * A death names the terms, so only the owner and partners see it, like other terms events.
 */
@Injectable()
export class AnimalDepartureListener {
  constructor(
    private readonly activity: ActivityService,
    private readonly terms: TermsService,
  ) {}

  async onDeparture(em: EntityManager, d: AnimalDeparture): Promise<void> {
    const open = d.departure === 'died' ? { closedOn: null, endedEarlyReason: null } : {};
    // He is in a project as the male it started with, or as a backup male through a pairing.
    const paired = await em.find(Pairing, { male: d.animal.id }, { fields: ['project'] });
    const projects = await em.find(Project, { $or: [{ male: d.animal.id }, { id: { $in: paired.map((x) => x.project.id) } }], ...open }, { fields: ['id'] });
    for (const p of projects) {
      const clause = d.departure === 'died' ? ((await this.terms.inForce(p.id, em))?.failureClause ?? null) : null;
      this.activity.record(em, {
        projectId: p.id,
        actorId: d.actorId,
        kind: MALE_DEPARTURE_KINDS[d.departure],
        subjectType: 'animal',
        subjectId: d.animal.id,
        summary: maleDepartureSummary(d.departure, d.animal.label, d.on, clause),
        data: { on: d.on, ...(clause ? { failureClause: clause } : {}) },
        audience: d.departure === 'died' ? 'partners' : 'members',
      });
    }
  }
}

import { Injectable } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/postgresql';
import { serverWordsFor } from '@broodsilk/shared';
import type { AnimalMolted } from '../animals/animal-molt.registry';
import { ActivityService } from '../activity/activity.service';
import { Project } from './project.entity';
import { Pairing } from './pairing.entity';

/**
 * A female's molt after a successful pairing sheds the stored sperm (docs/trade-facts.md): each of
 * her open projects (not closed, not ended early) whose last successful pairing came before the molt
 * gets an event on its timeline, which its partners hear about.
 */
@Injectable()
export class FemaleMoltListener {
  constructor(private readonly activity: ActivityService) {}

  async onMolt(em: EntityManager, m: AnimalMolted): Promise<void> {
    if (m.animal.sex !== 'female') return;
    const projects = await em.find(Project, { female: m.animal.id, closedOn: null, endedEarlyReason: null }, { fields: ['id'] });
    for (const p of projects) {
      const pairings = await em.find(Pairing, { project: p.id }, { orderBy: { startedOn: 'desc', createdAt: 'desc' } });
      const struck = new Set(pairings.map((x) => x.corrects?.id).filter(Boolean));
      const paired = pairings.find((x) => !struck.has(x.id) && x.outcome === 'connected' && x.startedOn < m.moltedOn);
      if (!paired) continue;
      const data = { female: m.animal.label, moltedOn: m.moltedOn, pairedOn: paired.startedOn };
      this.activity.record(em, {
        projectId: p.id,
        actorId: m.actorId,
        kind: 'female.molted',
        subjectType: 'animal',
        subjectId: m.animal.id,
        summary: serverWordsFor('en')('partnerUpdate.femaleMolted', data),
        data,
      });
    }
  }
}

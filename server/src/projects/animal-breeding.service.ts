import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { AnimalBreedingRow } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { AnimalsService } from '../animals/animals.service';
import { Project } from './project.entity';
import { Pairing } from './pairing.entity';
import { ProjectStageService } from './project-stage.service';

/** An animal's breeding record for its page: each project it is in, with pairings and sacs. */
@Injectable()
export class AnimalBreedingService {
  constructor(
    private readonly em: EntityManager,
    private readonly animals: AnimalsService,
    private readonly stages: ProjectStageService,
  ) {}

  async forAnimal(viewer: AuthUser, animalId: string): Promise<AnimalBreedingRow[]> {
    const animal = await this.animals.ownOrForbid(viewer, animalId);
    // A backup male is in a project through its pairings.
    const paired = await this.em.find(Pairing, { male: animal.id }, { fields: ['project'] });
    const projects = await this.em.find(
      Project,
      { $or: [{ female: animal.id }, { male: animal.id }, { id: { $in: paired.map((x) => x.project.id) } }] },
      { populate: ['female', 'male'], orderBy: { createdAt: 'desc', id: 'asc' } },
    );
    const standings = await this.stages.standings(projects);
    return projects.map((p) => {
      const { stage, facts, males } = standings.get(p.id)!;
      const role = p.female.id === animal.id ? 'female' : 'male';
      return {
        project: { id: p.id, title: p.title },
        role,
        partnerLabel: role === 'female' ? males.map((m) => m.label).join(', ') : p.female.label,
        stage,
        pairings: [...facts.pairings].sort((a, b) => a.on.localeCompare(b.on)),
        sacs: [...facts.sacs]
          .sort((a, b) => a.layDate.localeCompare(b.layDate))
          .map((s) => ({ id: s.id ?? null, layDate: s.layDate, pulledOn: s.pulledOn ?? null, fate: s.fate, broodStage: s.broodStage ?? null })),
      };
    });
  }
}

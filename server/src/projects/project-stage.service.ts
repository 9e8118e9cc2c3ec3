import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import {
  deriveProjectStage,
  projectWarnings,
  type DerivedProjectStage,
  type FailureClause,
  type PairingFact,
  type PairingWarning,
  type ProjectFacts,
} from '@broodsilk/shared';
import { Molt } from '../animals/molt.entity';
import { effectiveBreeding } from '../species/effective-breeding';
import { ownBreeding } from '../species/species.mapper';
import { Pairing } from './pairing.entity';
import { struckPairings } from './pairings.mapper';
import type { Project } from './project.entity';
import { ProjectFactsRegistry, type KnownProjectFacts } from './project-facts.registry';
import type { Animal } from '../animals/animal.entity';
import { diedOn, lastMaleDiedOn, projectMales } from './project-males';

export interface ProjectStanding {
  stage: DerivedProjectStage;
  facts: ProjectFacts;
  /** The first male, then each other male paired with her (with species, recorder and owner). */
  males: Animal[];
}

/**
 * Gathers each project's facts (its pairings, the female's molts, the males' deaths, what the sacs
 * and accounts modules register) and derives stage and warnings with the shared rules.
 */
@Injectable()
export class ProjectStageService {
  constructor(
    private readonly em: EntityManager,
    private readonly registry: ProjectFactsRegistry,
  ) {}

  /**
   * Projects need `female` and `male` loaded (ids and status; `male.species` for warnings). Facts
   * the caller already has (`known`) are not loaded again.
   */
  async standings(projects: readonly Project[], known: KnownProjectFacts = {}): Promise<Map<string, ProjectStanding>> {
    const ids = projects.map((p) => p.id);
    const out = new Map<string, ProjectStanding>();
    if (!ids.length) return out;
    const [pairings, molts, contributed] = await Promise.all([
      this.em.find(Pairing, { project: { $in: ids } }, { fields: ['project', 'male', 'startedAt', 'startedOn', 'outcome', 'corrects'] }),
      this.em.find(Molt, { animal: { $in: projects.map((p) => p.female.id) } }, { fields: ['animal', 'moltedOn'] }),
      this.registry.collect(this.em, ids, known),
    ]);
    const struck = struckPairings(pairings);
    const inForce = pairings.filter((x) => !struck.has(x.id));
    const males = await projectMales(this.em, projects, inForce);
    for (const p of projects) {
      const facts: ProjectFacts = {
        pairings: inForce.filter((x) => x.project.id === p.id).map((x) => ({ on: x.startedOn, outcome: x.outcome })),
        femaleMolts: molts.filter((m) => m.animal.id === p.female.id).map((m) => m.moltedOn),
        sacs: contributed.get(p.id)?.sacs ?? [],
        sharesSettled: contributed.get(p.id)?.sharesSettled ?? false,
        closedOn: p.closedOn ?? null,
        endedEarly: p.endedEarlyReason ?? null,
        maleDiedOn: lastMaleDiedOn(males.get(p.id)!),
      };
      out.set(p.id, { stage: deriveProjectStage(facts), facts, males: males.get(p.id)! });
    }
    return out;
  }

  /** The project's pairings in force (corrected ones left out), e.g. to check a sac's lay date. */
  async pairingsInForce(projectId: string, em: EntityManager = this.em): Promise<PairingFact[]> {
    const rows = await em.find(Pairing, { project: projectId }, { fields: ['startedOn', 'outcome', 'corrects'] });
    const struck = struckPairings(rows);
    return rows.filter((x) => !struck.has(x.id)).map((x) => ({ on: x.startedOn, outcome: x.outcome }));
  }

  /**
   * Warnings while the project is open (not ended or closed by the keeper), for each of its males.
   * `failureClause` comes from the terms in force.
   */
  warnings(p: Project, standing: ProjectStanding, today: string, failureClause: FailureClause): PairingWarning[] {
    if (p.endedEarlyReason || p.closedOn) return [];
    return projectWarnings({
      today,
      pairings: standing.facts.pairings,
      femaleMolts: standing.facts.femaleMolts.filter((d) => d <= today),
      sacLayDates: standing.facts.sacs.map((s) => s.layDate),
      males: standing.males.map((m) => {
        const life = effectiveBreeding(m.species.group, ownBreeding(m.species)).matureMaleLifespanMonths.value;
        return {
          label: m.label,
          maturedOn: m.maturity === 'mature' ? (m.maturedOn ?? null) : null,
          lifespan: { minMonths: life.min, maxMonths: life.max },
          diedOn: diedOn(m),
          dueBackOn: m.custody === 'loan-in' ? (m.dueBackOn ?? null) : null,
          returnedOn: m.returnedOn ?? null,
        };
      }),
      failureClause,
    });
  }
}

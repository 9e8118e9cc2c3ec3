import { Injectable } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { SacFact } from '@broodsilk/shared';

/** What another module knows about a project's stage: its sacs, whether its shares are settled. */
export interface ProjectFactsContribution {
  sacs?: SacFact[];
  sharesSettled?: boolean;
}

export type ProjectFactName = keyof ProjectFactsContribution;

/** Answers for many projects at once (lists); a project missing from the map contributes nothing. */
export type ProjectFactsProvider = (em: EntityManager, projectIds: string[]) => Promise<Map<string, ProjectFactsContribution>>;

/**
 * Facts a caller has already worked out (the dashboard loads every account anyway), per project id:
 * the provider of such a fact is not asked again.
 */
export type KnownProjectFacts = { [F in ProjectFactName]?: ReadonlyMap<string, NonNullable<ProjectFactsContribution[F]>> };

/**
 * The sacs and accounts modules register their facts here (in `onModuleInit`), so the stage and
 * the warnings in project responses include them without projects importing those modules.
 */
@Injectable()
export class ProjectFactsRegistry {
  private readonly providers: { fact: ProjectFactName; provide: ProjectFactsProvider }[] = [];

  register(fact: ProjectFactName, provide: ProjectFactsProvider): void {
    this.providers.push({ fact, provide });
  }

  async collect(em: EntityManager, projectIds: string[], known: KnownProjectFacts = {}): Promise<Map<string, Required<ProjectFactsContribution>>> {
    const out = new Map(projectIds.map((id) => [id, { sacs: [...(known.sacs?.get(id) ?? [])], sharesSettled: known.sharesSettled?.get(id) ?? false }]));
    if (!projectIds.length) return out;
    for (const { fact, provide } of this.providers) {
      if (known[fact]) continue;
      for (const [id, c] of await provide(em, projectIds)) {
        const acc = out.get(id);
        if (!acc) continue;
        if (c.sacs) acc.sacs.push(...c.sacs);
        if (c.sharesSettled) acc.sharesSettled = true;
      }
    }
    return out;
  }
}

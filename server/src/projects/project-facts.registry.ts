import { Injectable } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { SacFact } from '@broodsilk/shared';

/** What another module knows about a project's stage: its sacs, whether its shares are settled. */
export interface ProjectFactsContribution {
  sacs?: SacFact[];
  sharesSettled?: boolean;
}

/** Answers for many projects at once (lists); a project missing from the map contributes nothing. */
export type ProjectFactsProvider = (em: EntityManager, projectIds: string[]) => Promise<Map<string, ProjectFactsContribution>>;

/**
 * The sacs and accounts modules register their facts here (in `onModuleInit`), so the stage and
 * the warnings in project responses include them without projects importing those modules.
 */
@Injectable()
export class ProjectFactsRegistry {
  private readonly providers: ProjectFactsProvider[] = [];

  register(provider: ProjectFactsProvider): void {
    this.providers.push(provider);
  }

  async collect(em: EntityManager, projectIds: string[]): Promise<Map<string, Required<ProjectFactsContribution>>> {
    const out = new Map(projectIds.map((id) => [id, { sacs: [] as SacFact[], sharesSettled: false }]));
    if (!projectIds.length) return out;
    for (const provider of this.providers) {
      for (const [id, c] of await provider(em, projectIds)) {
        const acc = out.get(id);
        if (!acc) continue;
        if (c.sacs) acc.sacs.push(...c.sacs);
        if (c.sharesSettled) acc.sharesSettled = true;
      }
    }
    return out;
  }
}

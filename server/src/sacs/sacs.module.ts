import { Module, type OnModuleInit } from '@nestjs/common';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { ProjectsModule } from '../projects/projects.module';
import { ProjectResolverRegistry } from '../projects/project-resolver.registry';
import { ProjectFactsRegistry } from '../projects/project-facts.registry';
import { ActivityModule } from '../activity/activity.module';
import { Sac } from './sac.entity';
import { SacLogEntry } from './sac-log-entry.entity';
import { SacOpening } from './sac-opening.entity';
import { BroodCount } from './brood-count.entity';
import { SacViewsService } from './sac-views.service';
import { SacsService } from './sacs.service';
import { BroodService } from './brood.service';
import { IncubatorRightsController, ProjectSacsController, SacsController } from './sacs.controller';
import { toSacFact } from './sacs.mapper';
import { CareLogService } from './care-log.service';
import { CareLogController } from './care-log.controller';
import { OPENING_PHOTO, OpeningService } from './opening.service';
import { BroodCountsService } from './brood-counts.service';
import { BroodController } from './brood.controller';
import { PhotosModule } from '../photos/photos.module';
import { PhotoAccessRegistry } from '../photos/photo-access.registry';
import { ProjectMember } from '../projects/project-member.entity';
import { KeptBackBatch } from './kept-back-batch.entity';
import { KeptBackLogEntry } from './kept-back-log-entry.entity';
import { KeptBackService } from './kept-back.service';
import { KeptBackController } from './kept-back.controller';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

@Module({
  imports: [
    MikroOrmModule.forFeature([Sac, SacLogEntry, SacOpening, BroodCount, KeptBackBatch, KeptBackLogEntry]),
    ProjectsModule,
    ActivityModule,
    PhotosModule,
  ],
  controllers: [ProjectSacsController, IncubatorRightsController, SacsController, CareLogController, BroodController, KeptBackController],
  providers: [SacViewsService, SacsService, BroodService, CareLogService, OpeningService, BroodCountsService, KeptBackService],
  exports: [SacViewsService, SacsService, BroodService],
})
export class SacsModule implements OnModuleInit {
  constructor(
    private readonly resolvers: ProjectResolverRegistry,
    private readonly facts: ProjectFactsRegistry,
    private readonly photoAccess: PhotoAccessRegistry,
  ) {}

  onModuleInit(): void {
    // A malformed id is simply "no such sac" (404), never a database error.
    this.resolvers.register('sac', async (em, id) => (UUID.test(id) ? ((await em.findOne(Sac, id, { fields: ['project'] }))?.project.id ?? null) : null));
    // Opening photos: the same access as the project (any member).
    this.photoAccess.register(OPENING_PHOTO, async (em, viewer, openingId) => {
      const o = await em.findOne(SacOpening, openingId, { populate: ['sac'] });
      return !!o && (await em.count(ProjectMember, { project: o.sac.project.id, user: viewer.id })) > 0;
    });
    this.facts.register('sacs', async (em, projectIds) => {
      const sacs = await em.find(Sac, { project: { $in: projectIds } });
      const out = new Map<string, { sacs: ReturnType<typeof toSacFact>[] }>();
      for (const s of sacs) {
        const entry = out.get(s.project.id) ?? { sacs: [] };
        entry.sacs.push(toSacFact(s));
        out.set(s.project.id, entry);
      }
      return out;
    });
  }
}

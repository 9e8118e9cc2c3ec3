import { Module, type OnModuleInit } from '@nestjs/common';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { AnimalsModule } from '../animals/animals.module';
import { AnimalUsageRegistry } from '../animals/animal-usage.registry';
import { ActivityModule } from '../activity/activity.module';
import { Project } from './project.entity';
import { ProjectMember } from './project-member.entity';
import { Pairing } from './pairing.entity';
import { TermsVersion } from './terms-version.entity';
import { TermsLine } from './terms-line.entity';
import { TermsAcceptance } from './terms-acceptance.entity';
import { ProjectAccessService } from './project-access.service';
import { ProjectResolverRegistry } from './project-resolver.registry';
import { ProjectFactsRegistry } from './project-facts.registry';

@Module({
  imports: [MikroOrmModule.forFeature([Project, ProjectMember, Pairing, TermsVersion, TermsLine, TermsAcceptance]), AnimalsModule, ActivityModule],
  providers: [ProjectAccessService, ProjectResolverRegistry, ProjectFactsRegistry],
  exports: [ProjectAccessService, ProjectResolverRegistry, ProjectFactsRegistry],
})
export class ProjectsModule implements OnModuleInit {
  constructor(private readonly usage: AnimalUsageRegistry) {}

  onModuleInit(): void {
    // An animal in a project keeps its record; the FK (restrict) is the safety net.
    this.usage.register(async (em, animalId) => {
      const p = await em.findOne(Project, { $or: [{ female: animalId }, { male: animalId }] }, { fields: ['title', 'female'] });
      if (!p) return null;
      return `It is the ${p.female.id === animalId ? 'female' : 'male'} of the project "${p.title}".`;
    });
  }
}

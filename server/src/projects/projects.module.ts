import { Module, type OnModuleInit } from '@nestjs/common';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { AnimalsModule } from '../animals/animals.module';
import { AnimalUsageRegistry } from '../animals/animal-usage.registry';
import { AnimalDepartureRegistry } from '../animals/animal-departure.registry';
import { AnimalMoltRegistry } from '../animals/animal-molt.registry';
import { AnimalReadersRegistry } from '../animals/animal-readers.registry';
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
import { ProjectStageService } from './project-stage.service';
import { ProjectsService } from './projects.service';
import { ProjectsController } from './projects.controller';
import { MembersService } from './members.service';
import { MembersController } from './members.controller';
import { TermsService } from './terms.service';
import { TermsController } from './terms.controller';
import { PairingsService } from './pairings.service';
import { PairingsController } from './pairings.controller';
import { AnimalDepartureListener } from './animal-departure.listener';
import { FemaleMoltListener } from './female-molt.listener';
import { AnimalBreedingService } from './animal-breeding.service';
import { AnimalBreedingController } from './animal-breeding.controller';

@Module({
  imports: [MikroOrmModule.forFeature([Project, ProjectMember, Pairing, TermsVersion, TermsLine, TermsAcceptance]), AnimalsModule, ActivityModule],
  controllers: [ProjectsController, MembersController, TermsController, PairingsController, AnimalBreedingController],
  providers: [
    ProjectAccessService,
    ProjectResolverRegistry,
    ProjectFactsRegistry,
    ProjectStageService,
    ProjectsService,
    MembersService,
    TermsService,
    PairingsService,
    AnimalDepartureListener,
    FemaleMoltListener,
    AnimalBreedingService,
  ],
  exports: [ProjectAccessService, ProjectResolverRegistry, ProjectFactsRegistry, ProjectStageService, TermsService],
})
export class ProjectsModule implements OnModuleInit {
  constructor(
    private readonly usage: AnimalUsageRegistry,
    private readonly departures: AnimalDepartureRegistry,
    private readonly departureListener: AnimalDepartureListener,
    private readonly readers: AnimalReadersRegistry,
    private readonly molts: AnimalMoltRegistry,
    private readonly moltListener: FemaleMoltListener,
  ) {}

  onModuleInit(): void {
    this.departures.register((em, d) => this.departureListener.onDeparture(em, d));
    this.molts.register((em, m) => this.moltListener.onMolt(em, m));
    // Members of a project see its animals (read-only): the female, the first male and every male paired with her.
    this.readers.register(async (em, animalId, userId) => {
      const paired = await em.find(Pairing, { male: animalId }, { fields: ['project'] });
      const inProject = { $or: [{ female: animalId }, { male: animalId }, { id: { $in: paired.map((x) => x.project.id) } }] };
      return (await em.count(ProjectMember, { user: userId, project: inProject })) > 0;
    });
    // An animal in a project keeps its record; the FK (restrict) is the safety net.
    this.usage.register(async (em, animalId) => {
      const p = await em.findOne(Project, { $or: [{ female: animalId }, { male: animalId }] }, { fields: ['title', 'female'] });
      if (p) return { key: p.female.id === animalId ? 'animal.femaleOfProject' : 'animal.maleOfProject', values: { project: p.title } };
      const paired = await em.findOne(Pairing, { male: animalId }, { populate: ['project'] });
      return paired ? { key: 'animal.pairedInProject', values: { project: paired.project.title } } : null;
    });
  }
}

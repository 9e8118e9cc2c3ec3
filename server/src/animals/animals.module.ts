import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { storageConfig } from '../config/storage.config';
import { PhotosModule } from '../photos/photos.module';
import { Animal } from './animal.entity';
import { Molt } from './molt.entity';
import { FeedingEntry } from './feeding-entry.entity';
import { AnimalDepartureRegistry } from './animal-departure.registry';
import { AnimalMoltRegistry } from './animal-molt.registry';
import { AnimalReadersRegistry } from './animal-readers.registry';
import { AnimalLifeService } from './animal-life.service';
import { AnimalLifeController } from './animal-life.controller';
import { FeedingsService } from './feedings.service';
import { FeedingsController } from './feedings.controller';
import { AnimalsService } from './animals.service';
import { AnimalsController } from './animals.controller';
import { AnimalUsageRegistry } from './animal-usage.registry';
import { MoltsService } from './molts.service';
import { MoltsController } from './molts.controller';
import { AnimalPhotosService } from './animal-photos.service';
import { AnimalPhotosController } from './animal-photos.controller';
import { AnimalsCsvService } from './animals-csv.service';
import { AnimalsCsvController } from './animals-csv.controller';
import { AnimalOwnershipController } from './animal-ownership.controller';
import { AnimalOwnershipService } from './animal-ownership.service';

@Module({
  imports: [ConfigModule.forFeature(storageConfig), MikroOrmModule.forFeature([Animal, Molt, FeedingEntry]), PhotosModule],
  controllers: [
    AnimalsCsvController,
    AnimalOwnershipController,
    AnimalsController,
    MoltsController,
    AnimalPhotosController,
    AnimalLifeController,
    FeedingsController,
  ],
  providers: [
    AnimalsService,
    AnimalOwnershipService,
    AnimalsCsvService,
    AnimalUsageRegistry,
    AnimalDepartureRegistry,
    AnimalMoltRegistry,
    AnimalReadersRegistry,
    MoltsService,
    AnimalPhotosService,
    AnimalLifeService,
    FeedingsService,
  ],
  exports: [AnimalsService, AnimalUsageRegistry, AnimalDepartureRegistry, AnimalMoltRegistry, AnimalReadersRegistry],
})
export class AnimalsModule {}

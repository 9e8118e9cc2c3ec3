import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { storageConfig } from '../config/storage.config';
import { PhotosModule } from '../photos/photos.module';
import { Animal } from './animal.entity';
import { Molt } from './molt.entity';
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
  imports: [ConfigModule.forFeature(storageConfig), MikroOrmModule.forFeature([Animal, Molt]), PhotosModule],
  controllers: [AnimalsCsvController, AnimalOwnershipController, AnimalsController, MoltsController, AnimalPhotosController],
  providers: [AnimalsService, AnimalOwnershipService, AnimalsCsvService, AnimalUsageRegistry, MoltsService, AnimalPhotosService],
  exports: [AnimalsService, AnimalUsageRegistry],
})
export class AnimalsModule {}

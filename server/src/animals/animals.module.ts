import { Module } from '@nestjs/common';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Animal } from './animal.entity';
import { Molt } from './molt.entity';
import { AnimalsService } from './animals.service';
import { AnimalsController } from './animals.controller';
import { AnimalUsageRegistry } from './animal-usage.registry';

@Module({
  imports: [MikroOrmModule.forFeature([Animal, Molt])],
  controllers: [AnimalsController],
  providers: [AnimalsService, AnimalUsageRegistry],
  exports: [AnimalsService, AnimalUsageRegistry],
})
export class AnimalsModule {}
